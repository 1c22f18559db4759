// Which values of the record still hold what the visit plan put there: the station counts
// above all, which are the plan's estimates until the technician enters the stations taken.
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import type { CaptureRecord } from '@/shared/capture-record';
import { planOrigin } from '@/shared/plan-record';
import type { VisitPlan } from '@/shared/visit-plan';

export function FromPlanNotice({ record, plan, filled }: { record: CaptureRecord; plan: VisitPlan; filled: boolean }) {
  const origin = planOrigin(record, plan);
  const estimated = record.rooms.filter((r) => origin.rooms[r.key]?.stations).map((r) => r.name.trim() || 'unnamed room');
  const models = record.models.filter((m) => origin.models.has(m.key)).length;
  if (!filled && estimated.length === 0 && models === 0) return null;
  return (
    <Notice tone="info">
      <Text>
        {filled
          ? 'Filled from your visit plan: structures, models and split reasons, levels, rooms with rough sizes, expected stations and hazards. Everything stays editable.'
          : 'Parts of this record came from your visit plan.'}
      </Text>
      {estimated.length ? (
        <Text>{`Station counts still as planned (estimates): ${estimated.join(', ')}. Enter the stations you took.`}</Text>
      ) : null}
      {models ? <Text>{`${models} model(s) as planned.`}</Text> : null}
    </Notice>
  );
}
