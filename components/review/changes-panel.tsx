import { Image, StyleSheet, View } from 'react-native';

import { Badge } from '@/components/ui/badge';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { StoredFile } from '@/shared/files';
import { REWORK_RESPONSE_LABELS, type Workspace } from '@/shared/review';
import { type Change, groupChangesBySection } from '@/shared/revision-diff';

const KIND_WORD = { added: 'Added', removed: 'Removed', changed: 'Changed' } as const;

// For a resubmission: the technician's answers and what changed since the reviewed revision.
export function ChangesPanel({
  previous,
  currentRevision,
  files,
}: {
  previous: NonNullable<Workspace['previous']>;
  currentRevision: number;
  files: Pick<StoredFile, 'id' | 'name' | 'contentType'>[];
}) {
  const fileName = (id: number) => files.find((f) => f.id === id)?.name ?? 'a file no longer attached';
  const groups = groupChangesBySection(previous.changes);
  return (
    <View style={styles.card} role="region" aria-label="Changes since the last review">
      <Text variant="heading" role="heading" aria-level={2}>{`Resubmission: revision ${previous.revision} → ${currentRevision}`}</Text>
      <Text variant="muted">
        {previous.hidden
          ? `The review of revision ${previous.revision} is hidden while its blind second review is open; score this revision afresh.`
          : `Revision ${previous.revision} scored ${previous.score ?? '–'}.`}
      </Text>
      {previous.items.length ? <Text variant="label">Technician&apos;s answers</Text> : null}
      {previous.items.map((item) => (
        <View key={item.id} style={styles.item}>
          <View style={styles.head}>
            <Text style={{ fontFamily: fonts.semibold, flexShrink: 1 }}>{item.title}</Text>
            <Badge
              label={item.response ? REWORK_RESPONSE_LABELS[item.response] : 'Not answered'}
              tone={item.response === 'fixed' ? 'pass' : item.response ? 'rework' : 'fail'}
            />
          </View>
          <Text variant="small">{`Asked: ${item.instruction}`}</Text>
          {item.responseNote ? <Text variant="small">{`Answer: ${item.responseNote}`}</Text> : null}
          {item.responseFileIds.length ? (
            <Text variant="small">{`Files attached to the answer: ${item.responseFileIds.map(fileName).join(', ')} (see Files)`}</Text>
          ) : null}
        </View>
      ))}
      <Text variant="label">{`What changed (${previous.changes.length})`}</Text>
      {previous.changes.length === 0 ? <Text variant="muted">Nothing in the record changed.</Text> : null}
      {groups.map((group) => (
        <View key={group.section} style={styles.group} role="group" aria-label={`Changes in ${group.title}`}>
          <Text style={{ fontFamily: fonts.semibold }}>{group.title}</Text>
          {group.changes.map((change) => {
            const image = addedImage(change, files);
            return (
              <View key={`${change.path}-${change.kind}`} style={image ? styles.withThumb : undefined}>
                {image ? (
                  <Image source={{ uri: `/api/files/${image.id}` }} style={styles.thumb} accessibilityLabel={`Preview of ${image.name}`} />
                ) : null}
                <Text variant="small" style={{ flexShrink: 1 }}>
                  {change.kind === 'changed'
                    ? `${change.label}: was ${change.before}, now ${change.after}`
                    : `${KIND_WORD[change.kind]}: ${change.label} (${change.kind === 'added' ? change.after : change.before})`}
                </Text>
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

// A photo attached since the last revision, shown as a thumbnail beside its line.
function addedImage(change: Change, files: Pick<StoredFile, 'id' | 'name' | 'contentType'>[]) {
  if (change.part !== 'files' || change.kind !== 'added') return null;
  const id = Number(change.path.split('.')[1]);
  const file = files.find((f) => f.id === id);
  return file && file.contentType.startsWith('image/') ? file : null;
}

const styles = StyleSheet.create({
  withThumb: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  thumb: { width: 96, height: 64, borderRadius: 4, backgroundColor: colors.paper },
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.accent, borderRadius: 8, padding: space.lg, gap: space.sm },
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.sm, gap: 2 },
  group: { gap: 2, paddingTop: space.xs },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
});
