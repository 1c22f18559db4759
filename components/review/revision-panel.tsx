import { Image, Linking, Pressable, StyleSheet, View } from 'react-native';

import { FindingsPanel } from '@/components/capture-record/findings-panel';
import { RecordView } from '@/components/jobs/record-view';
import { formatBytes } from '@/components/lib/format';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { FILE_KIND_LABELS } from '@/shared/files';
import type { Workspace } from '@/shared/review';

// Left side of the scoring screen: the submitted record, its files and the pre-submit findings.
export function RevisionPanel({ revision }: { revision: Workspace['revision'] }) {
  return (
    <View style={{ gap: space.md }}>
      <View style={styles.card}>
        <Text variant="heading" role="heading" aria-level={2}>{`Capture record, revision ${revision.number}`}</Text>
        <RecordView record={revision.record} />
      </View>
      <View style={styles.card}>
        <Text variant="heading" role="heading" aria-level={2}>
          Files
        </Text>
        {revision.files.length === 0 ? <Text variant="muted">No files attached.</Text> : null}
        <View style={styles.files}>
          {revision.files.map((file) => (
            <Pressable
              key={file.id}
              role="link"
              accessibilityLabel={`Open ${file.name}`}
              onPress={() => void Linking.openURL(`/api/files/${file.id}`)}
              style={styles.file}
            >
              {file.contentType.startsWith('image/') ? (
                <Image source={{ uri: `/api/files/${file.id}` }} style={styles.thumb} accessibilityLabel={`Preview of ${file.name}`} />
              ) : (
                <View style={[styles.thumb, styles.doc]}>
                  <Text style={{ fontFamily: fonts.semibold }}>{file.contentType === 'application/pdf' ? 'PDF' : 'CSV'}</Text>
                </View>
              )}
              <Text variant="small">{file.name}</Text>
              <Text variant="muted">{`${FILE_KIND_LABELS[file.kind]} · ${formatBytes(file.sizeBytes)}`}</Text>
            </Pressable>
          ))}
        </View>
      </View>
      <FindingsPanel findings={revision.findings} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  files: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  file: { width: 150, gap: 2 },
  thumb: { width: 150, height: 100, borderRadius: 4, backgroundColor: colors.paper },
  doc: { alignItems: 'center', justifyContent: 'center', borderWidth: 1, borderColor: colors.line },
});
