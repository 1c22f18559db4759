import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { useState } from 'react';
import { useWindowDimensions, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors } from '@/components/ui/theme';
import type { WeeklyPoint } from '@/shared/trends';

import { CHART, shortWeek, XLabels, YAxis } from './chart-frame';
import { ChartReader, READ_HINT } from './chart-reader';

// Mean weighted score per week. Tap or hover a point to read its value; the text below the
// chart says the same for screen readers.
export function ScoreLineChart({ weekly, maxWidth }: { weekly: WeeklyPoint[]; maxWidth?: number }) {
  const { width: screen } = useWindowDimensions();
  const width = Math.min(maxWidth ?? 640, screen - 48);
  const [picked, setPicked] = useState<number | null>(null);
  const points = weekly.filter((w) => w.meanScore !== null);
  if (points.length === 0) return <Text variant="muted">No scored reviews in this period.</Text>;
  const { margin, height } = CHART;
  const x = scaleLinear()
    .domain([0, Math.max(points.length - 1, 1)])
    .range([margin.left, width - margin.right]);
  const y = scaleLinear()
    .domain([50, 100])
    .range([height - margin.bottom, margin.top])
    .clamp(true);
  const path =
    line<WeeklyPoint>()
      .x((_, i) => x(i))
      .y((d) => y(d.meanScore!))(points) ?? '';
  const best = points.reduce((a, b) => (b.meanScore! > a.meanScore! ? b : a));
  const worst = points.reduce((a, b) => (b.meanScore! < a.meanScore! ? b : a));
  const shown = picked !== null ? points[picked] : null;
  return (
    <View>
      <ChartReader label="Mean score per week" count={points.length} picked={picked} onPick={setPicked}>
        <Svg width={width} height={height} aria-hidden>
          <YAxis
            ticks={[50, 60, 70, 80, 90, 100]}
            y={y}
            left={margin.left}
            width={width - margin.left - margin.right}
            format={String}
            label="Mean score"
          />
          <Path d={path} stroke={colors.accent} strokeWidth={2} fill="none" />
          {points.map((p, i) => (
            <Circle
              key={p.week}
              cx={x(i)}
              cy={y(p.meanScore!)}
              r={picked === i ? 7 : 5}
              fill={colors.surface}
              stroke={colors.accent}
              strokeWidth={2}
              onPress={() => setPicked(i)}
              onPressIn={() => setPicked(i)}
            />
          ))}
          <XLabels labels={points.map((p) => p.week)} x={x} bottom={height - margin.bottom} />
        </Svg>
      </ChartReader>
      <Text variant="small" role="status">
        {shown ? `Week of ${shortWeek(shown.week)}: mean ${shown.meanScore!.toFixed(1)} over ${shown.reviews} review(s).` : READ_HINT}
      </Text>
      <Text variant="muted">{`Summary: ${points.length} week(s); highest ${best.meanScore!.toFixed(1)} (week of ${shortWeek(best.week)}), lowest ${worst.meanScore!.toFixed(1)} (week of ${shortWeek(worst.week)}); latest ${points.at(-1)!.meanScore!.toFixed(1)}.`}</Text>
    </View>
  );
}
