import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { Linking, Pressable, StyleSheet, View } from 'react-native';

import { formatBytes } from '@/components/lib/format';
import { useFileCaptionMutation, useFileDetachMutation } from '@/components/queries/job-files';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, fonts, space } from '@/components/ui/theme';
import {
  ACCEPTED_DESCRIPTION,
  ACCEPTED_TYPES,
  CAPTION_MAX_LENGTH,
  DEFAULT_UPLOAD_MAX_MB,
  FILE_KIND_LABELS,
  type StoredFile,
  UPLOAD_KINDS,
  type UploadKind,
} from '@/shared/files';

import { CameraButton } from './camera-button';
import { type UploadItem, useUploadQueue } from './use-upload-queue';

type Props = { jobId: number; files: StoredFile[]; editable: boolean; userId?: number };

export function FilesSection({ jobId, files, editable, userId }: Props) {
  const [kind, setKind] = useState<UploadKind>('photo');
  const queue = useUploadQueue(jobId, userId ?? 0);
  const detach = useFileDetachMutation(jobId);

  // Photos come several at a time, the way a phone takes them; other kinds one by one.
  const choose = async () => {
    const result = await DocumentPicker.getDocumentAsync({
      type: ACCEPTED_TYPES[kind],
      multiple: kind === 'photo',
      copyToCacheDirectory: false,
    });
    if (result.canceled) return;
    for (const asset of result.assets) {
      const blob = asset.file ?? (await (await fetch(asset.uri)).blob());
      await queue.add(kind, asset.name, blob);
    }
  };
  const addPhotos = async (picked: File[]) => {
    for (const file of picked) await queue.add('photo', file.name, file);
  };

  return (
    <Section title="Files" summary={`${files.length} attached: photos, floor sketch or station map, station coordinates`}>
      {files.map((file) => (
        <View key={file.id} style={styles.file}>
          <View style={{ flexShrink: 1, flexGrow: 1, gap: space.xs }}>
            <Text variant="label">{file.name}</Text>
            <Text variant="muted">{`${FILE_KIND_LABELS[file.kind]} · ${formatBytes(file.sizeBytes)} · SHA-256 ${file.sha256.slice(0, 12)}…`}</Text>
            {file.kind === 'photo' ? <CaptionField jobId={jobId} file={file} editable={editable} /> : null}
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
          <View style={styles.actions}>
            <Button
              label={kind === 'photo' ? 'Choose photos and upload' : 'Choose a file and upload'}
              tone="secondary"
              onPress={() => void choose()}
            />
            {kind === 'photo' ? <CameraButton onFiles={(picked) => void addPhotos(picked)} /> : null}
          </View>
          {queue.items.map((item) => (
            <UploadRow key={item.id} item={item} onRetry={() => void queue.retry()} onDismiss={() => queue.dismiss(item.id)} />
          ))}
        </>
      ) : null}
    </Section>
  );
}

// Saved when the field loses focus; the saved state is said in words.
function CaptionField({ jobId, file, editable }: { jobId: number; file: StoredFile; editable: boolean }) {
  const [text, setText] = useState(file.caption ?? '');
  const save = useFileCaptionMutation(jobId);
  if (!editable) return file.caption ? <Text variant="small">{file.caption}</Text> : null;
  const changed = text.trim() !== (file.caption ?? '');
  return (
    <View style={{ gap: 2 }}>
      <TextField
        label={`Caption for ${file.name}`}
        value={text}
        onChangeText={setText}
        onBlur={() => (changed ? save.mutate({ fileId: file.id, caption: text }) : undefined)}
        maxLength={CAPTION_MAX_LENGTH}
        placeholder="What it shows and where, e.g. Kitchen ceiling stain, east corner"
      />
      <Text variant="muted" role="status">
        {save.isPending
          ? 'Saving caption…'
          : save.error
            ? `Caption not saved: ${save.error.message}`
            : changed
              ? 'Not saved yet'
              : file.caption
                ? 'Caption saved'
                : ''}
      </Text>
    </View>
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
