import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { Linking, Pressable, StyleSheet, View } from 'react-native';

import { formatBytes } from '@/components/lib/format';
import { useFileDetachMutation } from '@/components/queries/job-files';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import {
  ACCEPTED_DESCRIPTION,
  ACCEPTED_TYPES,
  DEFAULT_UPLOAD_MAX_MB,
  FILE_KIND_LABELS,
  type StoredFile,
  UPLOAD_KINDS,
  type UploadKind,
} from '@/shared/files';

import { type UploadItem, useUploadQueue } from './use-upload-queue';

type Props = { jobId: number; files: StoredFile[]; editable: boolean; userId?: number };

export function FilesSection({ jobId, files, editable, userId }: Props) {
  const [kind, setKind] = useState<UploadKind>('photo');
  const queue = useUploadQueue(jobId, userId ?? 0);
  const detach = useFileDetachMutation(jobId);

  const choose = async () => {
    const result = await DocumentPicker.getDocumentAsync({ type: ACCEPTED_TYPES[kind], multiple: false, copyToCacheDirectory: false });
    if (result.canceled || !result.assets[0]) return;
    const asset = result.assets[0];
    const blob = asset.file ?? (await (await fetch(asset.uri)).blob());
    await queue.add(kind, asset.name, blob);
  };

  return (
    <Section title="Files" summary={`${files.length} attached: photos, floor sketch or station map, station coordinates`}>
      {files.map((file) => (
        <View key={file.id} style={styles.file}>
          <View style={{ flexShrink: 1 }}>
            <Text variant="label">{file.name}</Text>
            <Text variant="muted">{`${FILE_KIND_LABELS[file.kind]} · ${formatBytes(file.sizeBytes)} · SHA-256 ${file.sha256.slice(0, 12)}…`}</Text>
          </View>
          <View style={styles.actions}>
            <Pressable role="link" accessibilityLabel={`Open ${file.name}`} onPress={() => void Linking.openURL(`/api/files/${file.id}`)}>
              <Text style={{ color: colors.accent, fontFamily: fonts.semibold }}>Open</Text>
            </Pressable>
            {editable ? (
              <Pressable role="button" accessibilityLabel={`Remove ${file.name}`} onPress={() => detach.mutate(file.id)}>
                <Text style={{ color: colors.fail, fontFamily: fonts.semibold }}>Remove</Text>
              </Pressable>
            ) : null}
          </View>
        </View>
      ))}
      {editable ? (
        <>
          <ChoiceField<UploadKind>
            label="Kind of file to add"
            options={UPLOAD_KINDS.map((k) => ({ value: k, label: FILE_KIND_LABELS[k] }))}
            value={kind}
            onChange={setKind}
          />
          <Text variant="muted">{`${ACCEPTED_DESCRIPTION[kind]}, up to ${DEFAULT_UPLOAD_MAX_MB} MB. The type is checked from the file's content. Files wait on this phone while offline.`}</Text>
          <Button label="Choose a file and upload" tone="secondary" onPress={() => void choose()} />
          {queue.items.map((item) => (
            <UploadRow key={item.id} item={item} onRetry={() => void queue.retry()} onDismiss={() => queue.dismiss(item.id)} />
          ))}
        </>
      ) : null}
    </Section>
  );
}

const STATE_TEXT: Record<UploadItem['state'], string> = {
  waiting: 'Waiting to upload',
  uploading: 'Uploading',
  failed: 'Upload failed',
  refused: 'Not uploaded',
  done: 'Uploaded',
};

function UploadRow({ item, onRetry, onDismiss }: { item: UploadItem; onRetry: () => void; onDismiss: () => void }) {
  return (
    <View style={{ gap: space.xs }}>
      <ProgressBar fraction={item.fraction} label={`${STATE_TEXT[item.state]} ${item.name}`} />
      {item.message ? <Notice tone={item.state === 'refused' || item.state === 'failed' ? 'error' : 'info'}>{item.message}</Notice> : null}
      <View style={styles.actions}>
        {item.state === 'failed' && item.retryable ? <Button label="Retry upload" onPress={onRetry} /> : null}
        {item.state === 'refused' || item.state === 'done' ? <Button label="Dismiss" tone="secondary" onPress={onDismiss} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  file: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: space.md,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    paddingVertical: space.sm,
  },
  actions: { flexDirection: 'row', gap: space.lg, alignItems: 'center' },
});
