import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { Linking, Pressable, StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { formatBytes } from '@/components/lib/format';
import { useFileDetachMutation, useFileUploadMutation } from '@/components/queries/job-files';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { ACCEPTED_DESCRIPTION, ACCEPTED_TYPES, FILE_KIND_LABELS, FILE_KINDS, type FileKind, type StoredFile } from '@/shared/files';

type Pending = { kind: FileKind; name: string; blob: Blob };
type UploadState =
  | { status: 'idle' }
  | { status: 'uploading'; pending: Pending; fraction: number }
  | { status: 'done'; name: string }
  | { status: 'failed'; pending: Pending; message: string };

export function FilesSection({ jobId, files, editable }: { jobId: number; files: StoredFile[]; editable: boolean }) {
  const [kind, setKind] = useState<FileKind>('photo');
  const [state, setState] = useState<UploadState>({ status: 'idle' });
  const upload = useFileUploadMutation(jobId);
  const detach = useFileDetachMutation(jobId);

  const send = async (pending: Pending) => {
    setState({ status: 'uploading', pending, fraction: 0 });
    try {
      await upload.mutateAsync({
        kind: pending.kind,
        file: pending.blob,
        name: pending.name,
        onProgress: (fraction) => setState({ status: 'uploading', pending, fraction }),
      });
      setState({ status: 'done', name: pending.name });
    } catch (error) {
      const message = error instanceof ApiError ? (error.fields.file ?? error.fields.kind ?? error.message) : 'Upload failed.';
      setState({ status: 'failed', pending, message });
    }
  };

  const choose = async () => {
    const result = await DocumentPicker.getDocumentAsync({ type: ACCEPTED_TYPES[kind], multiple: false, copyToCacheDirectory: false });
    if (result.canceled || !result.assets[0]) return;
    const asset = result.assets[0];
    const blob = asset.file ?? (await (await fetch(asset.uri)).blob());
    await send({ kind, name: asset.name, blob });
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
          <ChoiceField<FileKind>
            label="Kind of file to add"
            options={FILE_KINDS.map((k) => ({ value: k, label: FILE_KIND_LABELS[k] }))}
            value={kind}
            onChange={setKind}
          />
          <Text variant="muted">{`${ACCEPTED_DESCRIPTION[kind]}, up to 25 MB. The type is checked from the file's content.`}</Text>
          <Button label="Choose a file and upload" tone="secondary" onPress={() => void choose()} busy={state.status === 'uploading'} />
          {state.status === 'uploading' ? <ProgressBar fraction={state.fraction} label={`Uploading ${state.pending.name}`} /> : null}
          {state.status === 'done' ? <ProgressBar fraction={1} label={`Uploaded ${state.name}`} /> : null}
          {state.status === 'failed' ? (
            <View style={{ gap: space.sm }}>
              <Notice tone="error">{`${state.pending.name}: ${state.message}`}</Notice>
              <Button label="Retry upload" onPress={() => void send(state.pending)} />
            </View>
          ) : null}
        </>
      ) : null}
    </Section>
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
