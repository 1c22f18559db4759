import { useStationAnalysisQuery } from '@/components/queries/jobs';
import { Notice } from '@/components/ui/notice';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';

import { StationPlot } from './station-plot';

// The station plan for a job: the working record (technician, still on site) or a revision.
export function StationSection({ jobId, revision, hasFile }: { jobId: number; revision: number | null; hasFile: boolean }) {
  const query = useStationAnalysisQuery(jobId, revision, hasFile);
  if (!hasFile) return null;
  return (
    <Section
      title="Station layout"
      summary={
        revision ? `From the station file of revision ${revision}` : 'From your station file: check it while you can still add stations'
      }
    >
      {query.error ? <Notice tone="error">{query.error.message}</Notice> : null}
      {query.isPending ? <Text variant="muted">Analysing stations…</Text> : null}
      {query.data && !query.data.analysis ? <Text variant="muted">No station file for this record.</Text> : null}
      {query.data?.analysis ? <StationPlot analysis={query.data.analysis} units={query.data.units} /> : null}
    </Section>
  );
}
