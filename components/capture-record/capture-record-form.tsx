import { useCallback, useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { ConflictPanel } from '@/components/device/conflict-panel';
import { ApiError } from '@/components/lib/api-client';
import { lazyView } from '@/components/lib/lazy-view';
import { saveRecordDraft, useRecordSubmitMutation } from '@/components/queries/capture-record';
import { useStationAnalysisQuery } from '@/components/queries/jobs';
import { RiskHintPanel } from '@/components/risk/risk-hint-panel';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import { type JobDetail } from '@/shared/api-types';
import type { CaptureRecord } from '@/shared/capture-record';
import { isUntouchedRecord, recordFromPlan } from '@/shared/plan-record';
import { checkCaptureRecord } from '@/shared/pre-submit-checks';
import { diffRevisions } from '@/shared/revision-diff';
import type { LengthUnit } from '@/shared/units';
import type { VisitPlan } from '@/shared/visit-plan';

import { DamageSection } from './damage-section';
import { FilesSection } from './files-section';
import { FindingsPanel } from './findings-panel';
import { RecordFormContext } from './form-context';
import { type FormValues, toFormValues, toRecord } from './form-values';
import { FromPlanNotice } from './from-plan-notice';
import { GapsSection } from './gaps-section';
import { LevelsSection } from './levels-section';
import { ModelsSection } from './models-section';
import { CameraSection, NotesSection, PanoramasSection, ProcessingSection, SafetySection } from './other-sections';
import { RoomsSection } from './rooms-section';
import { SaveStatus } from './save-status';
import { toFormFields } from './server-fields';
import { StationsSection } from './stations-section';
import { type DraftVersion, useRecordSync } from './use-record-sync';

const StationSection = lazyView(() => import('@/components/stations/station-section').then((m) => m.StationSection), 'the station plan');

const recordOf = (values: FormValues) => toRecord(values).record;

type Props = { detail: JobDetail; userId: number; plan: VisitPlan | null };

// A record nobody has typed into opens filled from the visit plan; that filling is saved as
// the first change.
function openingRecord(detail: JobDetail, plan: VisitPlan | null) {
  const fill = plan !== null && isUntouchedRecord(detail.record) && (plan.structures.length > 0 || plan.rooms.length > 0);
  return { record: fill ? recordFromPlan(plan, detail.record) : detail.record, filled: fill };
}

export function CaptureRecordForm({ detail, userId, plan }: Props) {
  const jobId = detail.job.id;
  const [opening] = useState(() => openingRecord(detail, plan));
  const form = useForm<FormValues>({ defaultValues: toFormValues(opening.record) });
  const values = useWatch({ control: form.control }) as FormValues;
  const conversion = useMemo(() => toRecord(values), [values]);
  // The record is checked against the attached station file's counts, and a resubmission
  // against the last submission's time (processing must be confirmed again).
  const hasStationFile = detail.files.some((f) => f.kind === 'station_coordinates');
  const stations = useStationAnalysisQuery(jobId, null, hasStationFile);
  const previousSubmittedAt = detail.revisions.at(-1)?.submittedAt ?? null;
  const stationFileLevels = useMemo(
    () => stations.data?.analysis?.levels.map((l) => ({ level: l.level, stations: l.registered })) ?? null,
    [stations.data],
  );
  const findings = useMemo(
    () => checkCaptureRecord(conversion.record, { previousSubmittedAt, stationFileLevels, plan }),
    [conversion.record, previousSubmittedAt, stationFileLevels, plan],
  );
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const submit = useRecordSubmitMutation(jobId);
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;
  const saveRecord = useCallback((record: CaptureRecord, baseVersion: number) => saveRecordDraft(jobId, record, baseVersion), [jobId]);
  const replaceValues = useCallback((next: FormValues) => form.reset(next), [form]);
  const sync = useRecordSync({
    jobId,
    userId,
    server: { record: detail.record, version: detail.recordVersion, savedAt: detail.recordSavedAt },
    values,
    toRecord: recordOf,
    saveRecord,
    replaceValues,
    startsChanged: opening.filled,
  });

  // Switching units re-expresses the typed sizes in the new unit; the stored SI values do not change.
  const changeUnits = (unit: LengthUnit) => {
    const { record } = toRecord(form.getValues());
    form.reset(toFormValues({ ...record, units: unit }), { keepDefaultValues: true });
  };

  const onSubmit = async () => {
    setServerErrors({});
    await sync.flush();
    if (sync.status.kind === 'conflict') return;
    try {
      const result = await submit.mutateAsync({ record: conversion.record, baseVersion: sync.baseVersion() });
      await sync.submitted(result.recordVersion);
    } catch (error) {
      if (!(error instanceof ApiError)) return;
      if (error.code === 'stale_version') sync.enterConflict((error.body as { current: DraftVersion }).current);
      else setServerErrors(toFormFields(error.fields, conversion.record));
    }
  };

  const riskJob = useMemo(() => ({ lossType: detail.job.lossType, propertyType: detail.job.propertyType }), [detail.job]);
  const errors = { ...sync.refused, ...serverErrors, ...conversion.errors };
  const photos = detail.files.filter((f) => f.kind === 'photo');
  const isResubmission = detail.revisions.length > 0;

  const submitPanel = (
    <View style={{ gap: space.md }}>
      <FindingsPanel findings={findings} />
      <RiskHintPanel
        record={conversion.record}
        analysis={stations.data?.analysis ?? null}
        job={riskJob}
        revision={detail.revisions.length + 1}
        audience="technician"
      />
      {submit.error instanceof ApiError ? <Notice tone="error">{submit.error.message}</Notice> : null}
      <Button
        label={isResubmission ? `Submit revision ${detail.revisions.length + 1}` : 'Submit capture record'}
        onPress={() => void onSubmit()}
        disabled={findings.missing.length > 0 || Object.keys(conversion.errors).length > 0 || sync.status.kind === 'conflict'}
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
          <SaveStatus status={sync.status} problems={Object.keys(errors).length} />
          {sync.status.kind === 'conflict' && sync.mine ? (
            <ConflictPanel
              what="record"
              differences={diffRevisions({ record: sync.status.theirs.record, files: [] }, { record: recordOf(sync.mine), files: [] })}
              savedAt={sync.status.theirs.savedAt}
              onKeepMine={() => void sync.keepMine()}
              onUseTheirs={() => sync.status.kind === 'conflict' && void sync.useTheirs(toFormValues(sync.status.theirs.record))}
            />
          ) : null}
          {plan ? <FromPlanNotice record={conversion.record} plan={plan} filled={opening.filled} /> : null}
          <CameraSection onUnitsChange={changeUnits} />
          <LevelsSection />
          <RoomsSection />
          <StationsSection />
          <ModelsSection />
          <GapsSection />
          <DamageSection photos={photos} defaultLossType={detail.job.lossType} />
          <PanoramasSection />
          <FilesSection jobId={jobId} files={detail.files} editable userId={userId} />
          <StationSection jobId={jobId} revision={null} hasFile={hasStationFile} />
          <SafetySection />
          <NotesSection />
          <ProcessingSection previousSubmittedAt={previousSubmittedAt} />
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
