import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { useRecordSaveMutation, useRecordSubmitMutation } from '@/components/queries/capture-record';
import { StationSection } from '@/components/stations/station-section';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import { type JobDetail } from '@/shared/api-types';
import { checkCaptureRecord } from '@/shared/pre-submit-checks';
import type { LengthUnit } from '@/shared/units';

import { DamageSection } from './damage-section';
import { FilesSection } from './files-section';
import { FindingsPanel } from './findings-panel';
import { RecordFormContext } from './form-context';
import { type FormValues, toFormValues, toRecord } from './form-values';
import { GapsSection } from './gaps-section';
import { LevelsSection } from './levels-section';
import { ModelsSection } from './models-section';
import { CameraSection, NotesSection, PanoramasSection, ProcessingSection, SafetySection } from './other-sections';
import { RoomsSection } from './rooms-section';
import { StationsSection } from './stations-section';
import { describeAutosave, useAutosave } from './use-autosave';

export function CaptureRecordForm({ detail }: { detail: JobDetail }) {
  const jobId = detail.job.id;
  const form = useForm<FormValues>({ defaultValues: toFormValues(detail.record) });
  const values = useWatch({ control: form.control }) as FormValues;
  const conversion = useMemo(() => toRecord(values), [values]);
  const findings = useMemo(() => checkCaptureRecord(conversion.record), [conversion.record]);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const save = useRecordSaveMutation(jobId);
  const submit = useRecordSubmitMutation(jobId);
  const parseBlocked = Object.keys(conversion.errors).length > 0;
  const autosave = useAutosave(conversion.record, parseBlocked, save.mutateAsync);
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;

  // Switching units re-expresses the typed sizes in the new unit; the stored SI values do not change.
  const changeUnits = (unit: LengthUnit) => {
    const { record } = toRecord(form.getValues());
    form.reset(toFormValues({ ...record, units: unit }), { keepDefaultValues: true });
  };

  const onSubmit = async () => {
    setServerErrors({});
    try {
      await submit.mutateAsync(conversion.record);
    } catch (error) {
      if (error instanceof ApiError) setServerErrors(error.fields);
    }
  };

  const errors = { ...serverErrors, ...conversion.errors };
  const photos = detail.files.filter((f) => f.kind === 'photo');
  const isResubmission = detail.revisions.length > 0;

  const submitPanel = (
    <View style={{ gap: space.md }}>
      <FindingsPanel findings={findings} />
      {submit.error instanceof ApiError ? <Notice tone="error">{submit.error.message}</Notice> : null}
      <Button
        label={isResubmission ? `Submit revision ${detail.revisions.length + 1}` : 'Submit capture record'}
        onPress={() => void onSubmit()}
        disabled={findings.missing.length > 0 || parseBlocked}
        busy={submit.isPending}
        accessibilityHint={findings.missing.length ? 'Complete the missing facts first' : undefined}
      />
      {findings.missing.length > 0 ? <Text variant="muted">Submit opens once nothing is missing. Warnings do not block.</Text> : null}
    </View>
  );

  return (
    <RecordFormContext.Provider value={{ control: form.control, errors, unitLabel: values.units }}>
      <View style={[styles.layout, wide && styles.wideLayout]}>
        <View style={[styles.sections, wide && { flex: 2 }]} role="form" aria-label="Capture record">
          <Text
            variant="muted"
            role="status"
            aria-live="polite"
            style={autosave.state.status === 'error' || autosave.state.status === 'blocked' ? { color: colors.fail } : undefined}
          >
            {describeAutosave(autosave.state)}
          </Text>
          <CameraSection onUnitsChange={changeUnits} />
          <LevelsSection />
          <RoomsSection />
          <StationsSection />
          <ModelsSection />
          <GapsSection />
          <DamageSection photos={photos} defaultLossType={detail.job.lossType} />
          <PanoramasSection />
          <FilesSection jobId={jobId} files={detail.files} editable />
          <StationSection jobId={jobId} revision={null} hasFile={detail.files.some((f) => f.kind === 'station_coordinates')} />
          <SafetySection />
          <NotesSection />
          <ProcessingSection />
          {wide ? null : submitPanel}
        </View>
        {wide ? <View style={styles.aside}>{submitPanel}</View> : null}
      </View>
    </RecordFormContext.Provider>
  );
}

const styles = StyleSheet.create({
  layout: { gap: space.lg },
  wideLayout: { flexDirection: 'row', alignItems: 'flex-start' },
  sections: { gap: space.md },
  aside: { flex: 1, minWidth: 320, position: 'sticky' as 'relative', top: space.lg },
});
