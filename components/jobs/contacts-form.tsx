import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { useJobUpdateMutation } from '@/components/queries/jobs';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/ui/theme';
import { type ClaimContacts, CONTACT_FIELDS, CONTACT_LABELS } from '@/shared/contacts';

// A manager corrects the claim's contacts on an existing job; a blank field clears it.
export function ContactsForm({ jobId, contacts, onDone }: { jobId: number; contacts: ClaimContacts; onDone: () => void }) {
  const update = useJobUpdateMutation(jobId);
  const [values, setValues] = useState<Record<keyof ClaimContacts, string>>(
    () => Object.fromEntries(CONTACT_FIELDS.map((f) => [f, contacts[f] ?? ''])) as Record<keyof ClaimContacts, string>,
  );
  const fields = update.error instanceof ApiError ? update.error.fields : {};
  const save = () => update.mutate(values, { onSuccess: onDone });
  return (
    <View style={styles.form} role="form" aria-label="Edit claim contacts">
      {CONTACT_FIELDS.map((field) => (
        <TextField
          key={field}
          label={CONTACT_LABELS[field]}
          value={values[field]}
          onChangeText={(text) => setValues((v) => ({ ...v, [field]: text }))}
          error={fields[field]}
          multiline={field === 'accessNotes'}
          inputMode={field === 'adjusterEmail' ? 'email' : field === 'policyholderPhone' ? 'tel' : 'text'}
          autoCapitalize={field === 'adjusterEmail' ? 'none' : 'sentences'}
        />
      ))}
      {update.error && !Object.keys(fields).length ? <Notice tone="error">{update.error.message}</Notice> : null}
      <View style={styles.actions}>
        <Button label="Save contacts" onPress={save} busy={update.isPending} />
        <Button label="Cancel" tone="secondary" onPress={onDone} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
