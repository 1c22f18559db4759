import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import Svg, { Circle, G, Line, Polygon, Rect, Text as SvgText } from 'react-native-svg';

import { useKeyboard } from '@/components/lib/use-keyboard';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { LEVEL_LABELS, type LevelKind } from '@/shared/capture-record';
import { boundsOf, scaleBar, viewFor } from '@/shared/plot-geometry';
import { levelMaxSpacing, type StationAnalysis } from '@/shared/station-analysis';
import type { LengthUnit } from '@/shared/units';

import { StationFindings } from './station-findings';

// A plan of one level: stations numbered in capture order, the registration chain, weak links
// and sparse stations marked by shape as well as colour, a scale bar, zoom and pan.
export function StationPlot({ analysis, units, keyboard = false }: { analysis: StationAnalysis; units: LengthUnit; keyboard?: boolean }) {
  const { width: screen } = useWindowDimensions();
  // The plan fills its column: measured, so it fits a phone, a half-width desktop column or more.
  const [available, setAvailable] = useState(0);
  const [level, setLevel] = useState<LevelKind>(analysis.levels[0]?.level ?? 'ground');
  const [zoom, setZoom] = useState(1);
  const [pan, setPan] = useState({ x: 0, y: 0 });
  const data = analysis.levels.find((l) => l.level === level) ?? analysis.levels[0];
  const width = Math.max(200, Math.min(available || screen - 48, 720));
  const height = Math.round(width * 0.7);
  const base = useMemo(() => boundsOf(data?.stations ?? [], 1), [data]);
  const view = viewFor(base, zoom, pan);
  const byNumber = useMemo(() => new Map((data?.stations ?? []).map((s) => [s.number, s])), [data]);
  const zoomBy = (f: number) => setZoom((z) => Math.min(16, Math.max(1, z * f)));
  const move = (dx: number, dy: number) => setPan((p) => ({ x: p.x + dx / zoom, y: p.y + dy / zoom }));

  useKeyboard(
    {
      '+': () => zoomBy(1.5),
      '-': () => zoomBy(1 / 1.5),
      '0': () => {
        setZoom(1);
        setPan({ x: 0, y: 0 });
      },
    },
    keyboard,
  );

  if (!data) return <Text variant="muted">No stations in the file.</Text>;
  // Keep marker sizes constant on screen whatever the zoom.
  const unitPx = view.width / width;
  const r = 5 * unitPx;
  const sparse = new Set(data.sparse);
  const bar = scaleBar(view.width / 4, units);
  const showNumbers = data.stations.length <= 200;

  return (
    <View style={{ gap: space.sm }} onLayout={(e) => setAvailable(e.nativeEvent.layout.width)}>
      {analysis.levels.length > 1 ? (
        <ChoiceField<LevelKind>
          label="Level"
          options={analysis.levels.map((l) => ({ value: l.level, label: LEVEL_LABELS[l.level] }))}
          value={level}
          onChange={(l) => {
            setLevel(l);
            setZoom(1);
            setPan({ x: 0, y: 0 });
          }}
        />
      ) : null}
      <View style={styles.frame}>
        <Svg
          width={width}
          height={height}
          viewBox={`${view.x} ${view.y} ${view.width} ${view.height}`}
          preserveAspectRatio="xMidYMid meet"
          accessibilityLabel={`Station plan of the ${LEVEL_LABELS[data.level].toLowerCase()}: ${data.registered} stations, ${data.weakLinks.length} weak link(s), ${data.sparse.length} sparse station(s)`}
        >
          {data.chain.map((link) => {
            const from = link.from !== null ? byNumber.get(link.from) : undefined;
            const to = byNumber.get(link.station);
            if (!from || !to) return null;
            return (
              <Line
                key={`l${link.station}`}
                x1={from.x}
                y1={from.y}
                x2={to.x}
                y2={to.y}
                stroke={link.weak ? colors.fail : colors.muted}
                strokeWidth={(link.weak ? 3 : 1.2) * unitPx}
                strokeDasharray={link.weak ? `${6 * unitPx} ${4 * unitPx}` : undefined}
              />
            );
          })}
          {data.stations.map((s) => {
            const label = showNumbers ? (
              <SvgText x={s.x + r * 1.3} y={s.y - r * 1.1} fontSize={11 * unitPx} fill={colors.ink} fontFamily={fonts.semibold}>
                {String(s.number)}
              </SvgText>
            ) : null;
            if (s.kind === 'panorama') {
              return (
                <G key={s.number}>
                  <Polygon
                    points={`${s.x},${s.y - r} ${s.x + r},${s.y} ${s.x},${s.y + r} ${s.x - r},${s.y}`}
                    fill={colors.surface}
                    stroke={colors.accent}
                    strokeWidth={1.5 * unitPx}
                  />
                  {label}
                </G>
              );
            }
            return (
              <G key={s.number}>
                {sparse.has(s.number) ? (
                  <Rect x={s.x - r} y={s.y - r} width={2 * r} height={2 * r} fill={colors.fail} />
                ) : (
                  <Circle cx={s.x} cy={s.y} r={r} fill={colors.ink} />
                )}
                {label}
              </G>
            );
          })}
          <G>
            <Line
              x1={view.x + view.width * 0.05}
              x2={view.x + view.width * 0.05 + bar.metres}
              y1={view.y + view.height * 0.94}
              y2={view.y + view.height * 0.94}
              stroke={colors.ink}
              strokeWidth={3 * unitPx}
            />
            <SvgText
              x={view.x + view.width * 0.05}
              y={view.y + view.height * 0.94 - 6 * unitPx}
              fontSize={12 * unitPx}
              fill={colors.ink}
              fontFamily={fonts.semibold}
            >
              {bar.label}
            </SvgText>
          </G>
        </Svg>
      </View>
      <View style={styles.controls} role="toolbar" aria-label="Zoom and pan the plan">
        <Button label="Zoom in" tone="secondary" onPress={() => zoomBy(1.5)} />
        <Button label="Zoom out" tone="secondary" onPress={() => zoomBy(1 / 1.5)} />
        <Button label="Left" tone="secondary" onPress={() => move(-0.15, 0)} />
        <Button label="Right" tone="secondary" onPress={() => move(0.15, 0)} />
        <Button label="Up" tone="secondary" onPress={() => move(0, -0.15)} />
        <Button label="Down" tone="secondary" onPress={() => move(0, 0.15)} />
        <Button
          label="Whole level"
          tone="secondary"
          onPress={() => {
            setZoom(1);
            setPan({ x: 0, y: 0 });
          }}
        />
      </View>
      <Text variant="small">
        Legend: ● registered station, numbered in capture order · ■ sparse station (its nearest neighbour is farther than the spacing limit)
        · ◆ supplementary panorama (not registered) · thin grey line: link to the nearest earlier station · thick dashed line: weak link (a
        long jump from everything captured before it, where registration tends to fail).
      </Text>
      <StationFindings level={data} units={units} maxSpacingM={levelMaxSpacing(analysis, data) ?? null} />
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, backgroundColor: colors.plot, alignSelf: 'flex-start' },
  controls: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
