import { useRouter } from 'expo-router';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, type TextInputProps, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { type NewJob, useJobCreateMutation } from '@/components/queries/jobs';
import { useTechniciansQuery } from '@/components/queries/technicians';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { DateField } from '@/components/ui/date-field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { CONTACT_FIELDS, CONTACT_LABELS } from '@/shared/contacts';
import {
  LOSS_TYPE_LABELS,
  LOSS_TYPES,
  type LossType,
  PRIORITIES,
  type Priority,
  PRIORITY_LABELS,
  PROPERTY_TYPE_LABELS,
  PROPERTY_TYPES,
  type PropertyType,
} from '@/shared/jobs';

type Values = Omit<NewJob, 'technicianId' | 'siteVisitDate' | 'dueAt'> & {
  technicianId: string;
  siteVisitDate: string;
  dueDate: string;
  dueTime: string;
};

const blankContacts = Object.fromEntries(CONTACT_FIELDS.map((f) => [f, ''])) as Record<(typeof CONTACT_FIELDS)[number], string>;

const options = <T extends string>(values: readonly T[], labels: Record<T, string>) =>
  values.map((value) => ({ value, label: labels[value] }));

export function NewJobForm() {
  const router = useRouter();
  const technicians = useTechniciansQuery();
  const create = useJobCreateMutation();
  const { control, handleSubmit, setError } = useForm<Values>({
    defaultValues: {
      claimReference: '',
      street: '',
      city: '',
      postcode: '',
      propertyType: 'single_family',
      lossType: 'water',
      lossDate: '',
      siteVisitDate: '',
      dueDate: '',
      dueTime: '17:00',
      priority: 'normal',
      technicianId: '',
      ...blankContacts,
    },
  });

  const submit = handleSubmit(async (values) => {
    // Each part is checked on its own, so the message lands on the part that is wrong.
    if (!/^\d{4}-\d{2}-\d{2}$/.test(values.dueDate) || Number.isNaN(new Date(`${values.dueDate}T12:00`).getTime())) {
      setError('dueDate', { message: 'Choose the delivery due date' });
      return;
    }
    if (!/^\d{2}:\d{2}$/.test(values.dueTime) || Number.isNaN(new Date(`${values.dueDate}T${values.dueTime}`).getTime())) {
      setError('dueTime', { message: 'Choose the due time (HH:MM)' });
      return;
    }
    const dueAt = new Date(`${values.dueDate}T${values.dueTime}`);
    try {
      const { job } = await create.mutateAsync({
        ...values,
        technicianId: Number(values.technicianId),
        siteVisitDate: values.siteVisitDate.trim() || null,
        dueAt: dueAt.toISOString(),
      });
      router.replace(`/jobs/${job.id}` as never);
    } catch (error) {
      if (error instanceof ApiError) {
        for (const [field, message] of Object.entries(error.fields)) {
          setError((field === 'dueAt' ? 'dueDate' : field) as keyof Values, { message });
        }
      }
    }
  });

  const date = (name: 'lossDate' | 'siteVisitDate' | 'dueDate' | 'dueTime', label: string, kind: 'date' | 'time', hint?: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <DateField
          label={label}
          kind={kind}
          hint={hint}
          value={String(field.value ?? '')}
          onChange={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
        />
      )}
    />
  );

  const text = (name: keyof Values, label: string, hint?: string, input: Partial<TextInputProps> = {}) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          {...input}
          label={label}
          hint={hint}
          value={String(field.value ?? '')}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
        />
      )}
    />
  );

  return (
    <Screen title="New job" subtitle="One site visit for one claim">
      <View style={styles.card} role="form" aria-label="New job">
        {create.error instanceof ApiError && Object.keys(create.error.fields).length === 0 ? (
          <Notice tone="error">{create.error.message}</Notice>
        ) : null}
        {text('claimReference', 'Claim reference', 'Letters, digits and dashes')}
        {text('street', 'Street address')}
        <View style={styles.row}>
          <View style={styles.grow}>{text('city', 'City')}</View>
          <View style={styles.grow}>{text('postcode', 'Postcode')}</View>
        </View>
        <Controller
          control={control}
          name="propertyType"
          render={({ field }) => (
            <ChoiceField<PropertyType>
              label="Property type"
              options={options(PROPERTY_TYPES, PROPERTY_TYPE_LABELS)}
              value={field.value}
              onChange={field.onChange}
            />
          )}
        />
        <Controller
          control={control}
          name="lossType"
          render={({ field }) => (
            <ChoiceField<LossType>
              label="Loss type"
              options={options(LOSS_TYPES, LOSS_TYPE_LABELS)}
              value={field.value}
              onChange={field.onChange}
            />
          )}
        />
        <View style={styles.row}>
          <View style={styles.grow}>{date('lossDate', 'Loss date', 'date')}</View>
          <View style={styles.grow}>{date('siteVisitDate', 'Site-visit date (optional)', 'date')}</View>
        </View>
        <View style={styles.row}>
          <View style={styles.grow}>{date('dueDate', 'Delivery due date', 'date')}</View>
          <View style={styles.grow}>{date('dueTime', 'Due time', 'time', 'Local time')}</View>
        </View>
        <Controller
          control={control}
          name="priority"
          render={({ field }) => (
            <ChoiceField<Priority>
              label="Priority"
              options={options(PRIORITIES, PRIORITY_LABELS)}
              value={field.value}
              onChange={field.onChange}
            />
          )}
        />
        <Controller
          control={control}
          name="technicianId"
          rules={{ required: 'Choose a technician' }}
          render={({ field, fieldState }) => (
            <ChoiceField<string>
              label="Assigned technician"
              options={(technicians.data ?? []).map((t) => ({ value: String(t.id), label: t.name }))}
              value={field.value}
              onChange={field.onChange}
              error={fieldState.error?.message}
            />
          )}
        />
        <Text variant="heading" role="heading" aria-level={2}>
          Claim contacts
        </Text>
        <Text variant="muted">
          All optional. The technician sees them on the job; the adjuster receives the summary link on acceptance.
        </Text>
        {text('clientName', CONTACT_LABELS.clientName, 'A carrier, third-party administrator or adjusting firm')}
        <View style={styles.row}>
          <View style={styles.grow}>{text('adjusterName', CONTACT_LABELS.adjusterName)}</View>
          <View style={styles.grow}>
            {text('adjusterEmail', CONTACT_LABELS.adjusterEmail, undefined, {
              inputMode: 'email',
              autoCapitalize: 'none',
              autoComplete: 'off',
            })}
          </View>
        </View>
        <View style={styles.row}>
          <View style={styles.grow}>{text('policyholderName', CONTACT_LABELS.policyholderName)}</View>
          <View style={styles.grow}>{text('policyholderPhone', CONTACT_LABELS.policyholderPhone, undefined, { inputMode: 'tel' })}</View>
        </View>
        {text('accessNotes', CONTACT_LABELS.accessNotes, 'Key or lockbox, pets, occupants, hazards known before the visit', {
          multiline: true,
          numberOfLines: 3,
        })}
        <Button label="Create job" onPress={submit} busy={create.isPending} />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.lg,
    gap: space.md,
    maxWidth: 760,
  },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  grow: { flexGrow: 1, flexBasis: 220 },
});
