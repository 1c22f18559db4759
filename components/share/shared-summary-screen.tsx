import { Image, ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';

import { lazyView } from '@/components/lib/lazy-view';
import { useSharedSummaryQuery } from '@/components/queries/delivery';
import { useDeferredFonts } from '@/components/ui/deferred-fonts';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, fonts, space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import { LEVEL_LABELS } from '@/shared/capture-record';
import { type DeliverySummary, photoLabel } from '@/shared/delivery-summary';

const PlanSketch = lazyView(() => import('./plan-sketch').then((m) => m.default), 'the station plan');

// The adjuster's read-only page: the same content as the summary PDF, with the photos and the
// PDF to download. Nothing else of Sightline is reachable from here.
export function SharedSummaryScreen({ token }: { token: string }) {
  useDeferredFonts();
  const query = useSharedSummaryQuery(token);
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;
  return (
    <ScrollView contentContainerStyle={[styles.page, wide && styles.pageWide]}>
      <Text variant="title" role="heading" aria-level={1}>
        Capture summary
      </Text>
      {query.isPending ? <Text variant="muted">Loading…</Text> : null}
      {query.error ? <Notice tone="error">{query.error.message}</Notice> : null}
      {query.data ? <Summary token={token} summary={query.data.summary} pdf={query.data.pdfAvailable} wide={wide} /> : null}
    </ScrollView>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={styles.section}>
      <Text variant="heading" role="heading" aria-level={2} style={{ color: colors.accent }}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const Fact = ({ label, value }: { label: string; value: string }) => (
  <Text>
    <Text style={{ fontFamily: fonts.semibold }}>{`${label}: `}</Text>
    {value}
  </Text>
);
const Bullet = ({ children }: { children: string }) => <Text>{`•  ${children}`}</Text>;

function Summary({ token, summary, pdf, wide }: { token: string; summary: DeliverySummary; pdf: boolean; wide: boolean }) {
  return (
    <View style={{ gap: space.lg }}>
      <Text variant="muted">Prepared by Sightline for the desk adjuster. Read only.</Text>
      {pdf ? (
        // A plain link (react-native-web renders an <a>): the file comes from the API, not a route.
        <Text role="link" style={styles.download} {...({ href: `/api/share/${token}/summary.pdf`, download: true } as object)}>
          Download the summary (PDF)
        </Text>
      ) : null}
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={styles.column}>
          <Section title={`Claim ${summary.claimReference}`}>
            <Fact label="Client" value={summary.client} />
            {summary.adjuster ? <Fact label="Desk adjuster" value={summary.adjuster} /> : null}
            <Fact label="Property" value={`${summary.property} (${summary.propertyType})`} />
            <Fact label="Loss" value={summary.loss} />
            <Fact label="Site visit" value={summary.siteVisit} />
            <Fact label="Technician" value={summary.technician} />
          </Section>
          <Section title="Quality control">
            <Fact label="Result" value={`Accepted, score ${summary.qc.score} (pass mark ${summary.qc.passMark})`} />
            <Fact label="Reviewed by" value={`${summary.qc.reviewer} on ${summary.qc.decidedOn}`} />
            <Fact label="Revisions submitted" value={String(summary.qc.revisions)} />
          </Section>
          <View style={styles.notShown} role="region" aria-label="What this capture does not show">
            <Text variant="heading" role="heading" aria-level={2}>
              What this capture does not show
            </Text>
            {summary.notShown.map((line) => (
              <Text key={line}>{line}</Text>
            ))}
          </View>
          <Section title="Models delivered">
            {summary.models.map((m) => (
              <Bullet
                key={m.reference + m.structure}
              >{`${m.structure}: ${m.reference}${m.split ? `. Separate model: ${m.split}` : ''}`}</Bullet>
            ))}
          </Section>
          <Section title="Levels and rooms">
            {summary.levels.map((l) => (
              <View key={l.level} style={{ gap: 2 }}>
                <Text style={{ fontFamily: fonts.semibold }}>{`${l.level}: ${l.stations} stations`}</Text>
                {l.rooms.map((r) => (
                  <Bullet key={r.name}>{`${r.name}: ${r.size}; ${r.stations} stations${r.doorway ? ', doorway station' : ''}`}</Bullet>
                ))}
              </View>
            ))}
          </Section>
        </View>
        <View style={styles.column}>
          {summary.plans.map((p) => (
            <Section key={p.level} title={`Station plan: ${LEVEL_LABELS[p.level]}`}>
              <PlanSketch plan={p} />
              <Text variant="muted">
                Dots are stations; lines join each to the one it was registered from; dashed lines are longer than the spacing limit.
              </Text>
            </Section>
          ))}
          <Section title="Damage">
            {summary.damage.length ? null : <Text>No damage area recorded.</Text>}
            {summary.damage.map((d) => (
              <View key={d.room + d.description} style={{ gap: space.xs }}>
                <Bullet>{`${d.room}: ${d.description}. ${d.stations}.`}</Bullet>
                {d.photos.map((p) => (
                  <View key={p.id} style={{ gap: space.xs }}>
                    <Image
                      source={{ uri: `/api/share/${token}/photos/${p.id}` }}
                      style={styles.photo}
                      resizeMode="contain"
                      accessibilityLabel={`Photo: ${photoLabel(p)}`}
                    />
                    <Text variant="small">{photoLabel(p)}</Text>
                  </View>
                ))}
              </View>
            ))}
          </Section>
          <Section title="Coverage gaps">
            {summary.gaps.length ? null : <Text>No coverage gap recorded.</Text>}
            {summary.gaps.map((g) => (
              <Bullet
                key={g.location}
              >{`${g.location}: ${g.cause}. ${g.resolved ? 'Resolved' : 'Open'}${g.note ? `. ${g.note}` : ''}`}</Bullet>
            ))}
          </Section>
          <Section title="Reflective surfaces">
            {summary.reflective.length ? null : <Text>None found.</Text>}
            {summary.reflective.map((r) => (
              <Bullet key={r.room + r.kind}>{`${r.room}: ${r.found} ${r.kind.toLowerCase()}(s) found, ${r.flagged} flagged`}</Bullet>
            ))}
          </Section>
          <Section title="Safety hazards noted on site">
            {summary.hazards.length ? null : <Text>None noted.</Text>}
            {summary.hazards.map((h) => (
              <Bullet key={h}>{h}</Bullet>
            ))}
          </Section>
        </View>
      </View>
      <Text variant="muted">{summary.footer}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, gap: space.lg, backgroundColor: colors.paper, minHeight: '100%' },
  pageWide: { paddingHorizontal: space.xxl, maxWidth: 1280, alignSelf: 'center', width: '100%' },
  columns: { gap: space.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { flex: 1, gap: space.lg },
  section: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.xs },
  notShown: {
    borderWidth: 2,
    borderColor: colors.accent,
    borderRadius: 8,
    padding: space.lg,
    gap: space.xs,
    backgroundColor: colors.surface,
  },
  download: { color: colors.accent, fontFamily: fonts.semibold, fontSize: 16, textDecorationLine: 'underline' },
  photo: { width: '100%', height: 220, backgroundColor: colors.plot },
});
