import { scaleLinear } from 'd3-scale';
import { useState } from 'react';
import { useWindowDimensions, View } from 'react-native';
import Svg, { Circle, Line, Polygon } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors } from '@/components/ui/theme';
import type { PChartRow } from '@/shared/statistics';

import { CHART, shortWeek, XLabels, YAxis } from './chart-frame';
import { ChartReader, READ_HINT } from './chart-reader';

const pct = (v: number) => `${Math.round(v * 100)} %`;

// Rework rate per week with 3-sigma limits from each week's own count. A point outside the
// limits is drawn as a triangle (not only a colour) and named in the text below.
export function ReworkPChart({ centre, rows, maxWidth }: { centre: number | null; rows: PChartRow[]; maxWidth?: number }) {
  const { width: screen } = useWindowDimensions();
  const width = Math.min(maxWidth ?? 640, screen - 48);
  const [picked, setPicked] = useState<number | null>(null);
  if (centre === null || rows.length === 0) return <Text variant="muted">No reviews in this period.</Text>;
  const { margin, height } = CHART;
  const x = scaleLinear()
    .domain([0, Math.max(rows.length - 1, 1)])
    .range([margin.left, width - margin.right]);
  const y = scaleLinear()
    .domain([0, 1])
    .range([height - margin.bottom, margin.top]);
  const step = rows.length > 1 ? (x(1) - x(0)) / 2 : 12;
  const outside = rows.filter((r) => r.outside);
  const shown = picked !== null ? rows[picked] : null;
  return (
    <View>
      <ChartReader label="Rework rate per week with control limits" count={rows.length} picked={picked} onPick={setPicked}>
        <Svg width={width} height={height} aria-hidden>
          <YAxis
            ticks={[0, 0.25, 0.5, 0.75, 1]}
            y={y}
            left={margin.left}
            width={width - margin.left - margin.right}
            format={pct}
            label="Rework rate"
          />
          <Line x1={margin.left} x2={width - margin.right} y1={y(centre)} y2={y(centre)} stroke={colors.ink} strokeWidth={1.5} />
          {rows.map((r, i) => (
            <Line
              key={`u${r.label}`}
              x1={x(i) - step}
              x2={x(i) + step}
              y1={y(r.ucl)}
              y2={y(r.ucl)}
              stroke={colors.muted}
              strokeDasharray="4 3"
            />
          ))}
          {rows.map((r, i) => (
            <Line
              key={`l${r.label}`}
              x1={x(i) - step}
              x2={x(i) + step}
              y1={y(r.lcl)}
              y2={y(r.lcl)}
              stroke={colors.muted}
              strokeDasharray="4 3"
            />
          ))}
          {rows.map((r, i) =>
            r.outside ? (
              <Polygon
                key={r.label}
                points={`${x(i)},${y(r.p) - 8} ${x(i) - 7},${y(r.p) + 5} ${x(i) + 7},${y(r.p) + 5}`}
                fill={colors.fail}
                onPress={() => setPicked(i)}
                onPressIn={() => setPicked(i)}
              />
            ) : (
              <Circle
                key={r.label}
                cx={x(i)}
                cy={y(r.p)}
                r={5}
                fill={colors.ink}
                onPress={() => setPicked(i)}
                onPressIn={() => setPicked(i)}
              />
            ),
          )}
          <XLabels labels={rows.map((r) => r.label)} x={x} bottom={height - margin.bottom} />
        </Svg>
      </ChartReader>
      <Text variant="small" role="status">
        {shown
          ? `Week of ${shortWeek(shown.label)}: ${shown.defects} of ${shown.n} reviews asked for rework (${pct(shown.p)}); limits ${pct(shown.lcl)} to ${pct(shown.ucl)}.`
          : `${READ_HINT} Solid line: average; dashed: 3-sigma limits for that week.`}
      </Text>
      <Text variant="muted">
        {outside.length
          ? `Outside the limits: ${outside.map((r) => `week of ${shortWeek(r.label)} (${pct(r.p)}, ${r.outside} the ${r.outside === 'above' ? 'upper' : 'lower'} limit)`).join('; ')}.`
          : `All ${rows.length} week(s) within the limits; average rework rate ${pct(centre)}.`}
      </Text>
    </View>
  );
}
