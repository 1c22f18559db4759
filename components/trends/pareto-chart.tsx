import { scaleBand, scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { useState } from 'react';
import { useWindowDimensions, View } from 'react-native';
import Svg, { Circle, G, Path, Rect, Text as SvgText } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors, fonts } from '@/components/ui/theme';
import type { ParetoBar } from '@/shared/trends';

import { ChartReader, READ_HINT } from './chart-reader';

// A slanted label has the bottom margin's diagonal to itself: about 18 characters at 10 px.
const LABEL_CHARS = 18;
const shortLabel = (label: string, max: number) => (label.length > max ? `${label.slice(0, max - 1)}…` : label);

// Most frequent shortfalls: bars by count, and the cumulative share as a line.
export function ParetoChart({ bars, title, maxWidth }: { bars: ParetoBar[]; title: string; maxWidth?: number }) {
  const { width: screen } = useWindowDimensions();
  const width = Math.min(maxWidth ?? 640, screen - 48);
  const [picked, setPicked] = useState<number | null>(null);
  const top = bars.slice(0, 8);
  if (top.length === 0) return <Text variant="muted">{`No ${title.toLowerCase()} in this period.`}</Text>;
  const height = 250;
  const margin = { top: 16, right: 40, bottom: 80, left: 56 };
  const x = scaleBand<number>()
    .domain(top.map((_, i) => i))
    .range([margin.left, width - margin.right])
    .padding(0.2);
  const max = Math.max(...top.map((b) => b.count));
  const y = scaleLinear()
    .domain([0, max])
    .range([height - margin.bottom, margin.top]);
  const share = scaleLinear()
    .domain([0, 1])
    .range([height - margin.bottom, margin.top]);
  const path =
    line<ParetoBar>()
      .x((_, i) => x(i)! + x.bandwidth() / 2)
      .y((b) => share(b.cumulativeShare))(top) ?? '';
  const shown = picked !== null ? top[picked] : null;
  return (
    <View>
      <ChartReader label={title} count={top.length} picked={picked} onPick={setPicked}>
        <Svg width={width} height={height} aria-hidden>
          {top.map((b, i) => (
            <G key={b.label}>
              <Rect
                x={x(i)}
                y={y(b.count)}
                width={x.bandwidth()}
                height={height - margin.bottom - y(b.count)}
                fill={picked === i ? colors.accent : colors.ink}
                onPress={() => setPicked(i)}
                onPressIn={() => setPicked(i)}
              />
              <SvgText
                x={x(i)! + x.bandwidth() / 2}
                y={y(b.count) - 4}
                fontSize={11}
                textAnchor="middle"
                fill={colors.ink}
                fontFamily={fonts.semibold}
              >
                {String(b.count)}
              </SvgText>
              {/* Slanted so neighbours never overlap; the full name shows when the bar is picked. */}
              <SvgText
                x={x(i)! + x.bandwidth() / 2}
                y={height - margin.bottom + 12}
                fontSize={10}
                textAnchor="end"
                fill={colors.muted}
                fontFamily={fonts.regular}
                transform={`rotate(-35 ${x(i)! + x.bandwidth() / 2} ${height - margin.bottom + 12})`}
              >
                {shortLabel(b.label, LABEL_CHARS)}
              </SvgText>
            </G>
          ))}
          <Path d={path} stroke={colors.accent} strokeWidth={2} fill="none" />
          {top.map((b, i) => (
            <Circle key={`c${b.label}`} cx={x(i)! + x.bandwidth() / 2} cy={share(b.cumulativeShare)} r={3} fill={colors.accent} />
          ))}
          <SvgText x={width - 4} y={share(1) + 4} fontSize={11} textAnchor="end" fill={colors.accent} fontFamily={fonts.semibold}>
            100 %
          </SvgText>
          <SvgText x={margin.left} y={height - 12} fontSize={11} fill={colors.ink} fontFamily={fonts.semibold}>
            Bars: count · line: cumulative share
          </SvgText>
        </Svg>
      </ChartReader>
      <Text variant="small" role="status">
        {shown ? `${shown.label}: ${shown.count}, ${Math.round(shown.cumulativeShare * 100)} % of all so far.` : READ_HINT}
      </Text>
      <Text variant="muted">{`Summary: ${top.map((b) => `${b.label} ${b.count}`).join(', ')}.`}</Text>
    </View>
  );
}
