// Shared pieces of the SVG charts: axes with labels, and the words that describe a chart.
import { G, Line, Text as SvgText } from 'react-native-svg';

import { colors, fonts } from '@/components/ui/theme';

export const CHART = { height: 220, margin: { top: 16, right: 16, bottom: 40, left: 48 } };

export function YAxis({
  ticks,
  y,
  left,
  width,
  format,
  label,
}: {
  ticks: number[];
  y: (v: number) => number;
  left: number;
  width: number;
  format: (v: number) => string;
  label: string;
}) {
  return (
    <G>
      {ticks.map((t) => (
        <G key={t}>
          <Line x1={left} x2={left + width} y1={y(t)} y2={y(t)} stroke={colors.line} strokeWidth={1} />
          <SvgText x={left - 6} y={y(t) + 4} fontSize={11} fill={colors.muted} textAnchor="end" fontFamily={fonts.regular}>
            {format(t)}
          </SvgText>
        </G>
      ))}
      <SvgText
        x={12}
        y={CHART.margin.top + 60}
        fontSize={11}
        fill={colors.ink}
        fontFamily={fonts.semibold}
        rotation={-90}
        origin={`12,${CHART.margin.top + 60}`}
        textAnchor="middle"
      >
        {label}
      </SvgText>
    </G>
  );
}

export function XLabels({ labels, x, bottom }: { labels: string[]; x: (i: number) => number; bottom: number }) {
  const every = Math.max(1, Math.ceil(labels.length / 6));
  return (
    <G>
      {labels.map((l, i) =>
        i % every === 0 ? (
          <SvgText key={l} x={x(i)} y={bottom + 16} fontSize={11} fill={colors.muted} textAnchor="middle" fontFamily={fonts.regular}>
            {shortWeek(l)}
          </SvgText>
        ) : null,
      )}
      <SvgText
        x={x((labels.length - 1) / 2)}
        y={bottom + 34}
        fontSize={11}
        fill={colors.ink}
        textAnchor="middle"
        fontFamily={fonts.semibold}
      >
        Week starting
      </SvgText>
    </G>
  );
}

export function shortWeek(iso: string) {
  const d = new Date(`${iso}T12:00:00Z`);
  return d.toLocaleDateString(undefined, { month: 'short', day: 'numeric', timeZone: 'UTC' });
}
