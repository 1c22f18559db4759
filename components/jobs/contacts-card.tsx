import { Link } from 'expo-router';
import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { type ClaimContacts, CONTACT_LABELS, mapHref, telHref } from '@/shared/contacts';
import type { JobSummary } from '@/shared/jobs';

import { ContactsForm } from './contacts-form';

const android = () => Platform.OS === 'android' || (typeof navigator !== 'undefined' && /android/i.test(navigator.userAgent));

// Who the job is for and how to get in, read on the phone before the visit: the phone number
// dials, the address opens the device's own map app.
export function ContactsCard({ job, contacts, canEdit = false }: { job: JobSummary; contacts: ClaimContacts; canEdit?: boolean }) {
  const [editing, setEditing] = useState(false);
  const address = `${job.street}, ${job.city} ${job.postcode}`;
  const row = (label: string, value: React.ReactNode) => (
    <View style={styles.row}>
      <Text variant="label">{label}</Text>
      {typeof value === 'string' ? <Text>{value}</Text> : value}
    </View>
  );
  const link = (href: string, text: string, label: string) => (
    <Link href={href as never} style={styles.link} aria-label={label}>
      {text}
    </Link>
  );
  return (
    <View style={styles.card} role="region" aria-label="Claim contacts">
      <Text variant="heading" role="heading" aria-level={2}>
        Claim contacts
      </Text>
      {editing ? <ContactsForm jobId={job.id} contacts={contacts} onDone={() => setEditing(false)} /> : null}
      {row('Property', link(mapHref(address, android() ? 'android' : 'other'), address, `Open ${address} in the map app`))}
      {row(CONTACT_LABELS.clientName, contacts.clientName ?? 'Not recorded')}
      {row(
        CONTACT_LABELS.adjusterName,
        contacts.adjusterName || contacts.adjusterEmail
          ? `${contacts.adjusterName ?? ''}${contacts.adjusterEmail ? ` (${contacts.adjusterEmail})` : ''}`.trim()
          : 'Not recorded',
      )}
      {row(CONTACT_LABELS.policyholderName, contacts.policyholderName ?? 'Not recorded')}
      {row(
        CONTACT_LABELS.policyholderPhone,
        contacts.policyholderPhone
          ? link(telHref(contacts.policyholderPhone), contacts.policyholderPhone, `Call ${contacts.policyholderPhone}`)
          : 'Not recorded',
      )}
      {row(CONTACT_LABELS.accessNotes, contacts.accessNotes ?? 'None recorded')}
      {canEdit && !editing ? (
        <View style={{ alignItems: 'flex-start' }}>
          <Button label="Edit contacts" tone="secondary" onPress={() => setEditing(true)} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  row: { gap: 2 },
  link: { color: colors.accent, fontFamily: fonts.semibold, fontSize: 16, textDecorationLine: 'underline' },
});
