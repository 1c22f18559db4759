import Svg, { Circle, Line, Rect } from 'react-native-svg';

import { colors } from '@/components/ui/theme';
import type { DeliverySummary } from '@/shared/delivery-summary';

const W = 320;
const H = 200;

// A level's stations and registration links, scaled to fit: the same drawing as the PDF's.
export default function PlanSketch({ plan }: { plan: DeliverySummary['plans'][number] }) {
  const xs = plan.stations.map((s) => s.x);
  const ys = plan.stations.map((s) => s.y);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const scale = Math.min((W - 20) / Math.max(maxX - minX, 1), (H - 20) / Math.max(maxY - minY, 1));
  const at = (s: { x: number; y: number }) => ({ x: 10 + (s.x - minX) * scale, y: H - 10 - (s.y - minY) * scale });
  const byNumber = new Map(plan.stations.map((s) => [s.number, s]));
  return (
    <Svg width="100%" height={H} viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`Station plan: ${plan.stations.length} stations`}>
      <Rect x={0.5} y={0.5} width={W - 1} height={H - 1} fill={colors.plot} stroke={colors.line} />
      {plan.links.map((l) => {
        const a = byNumber.get(l.from);
        const b = byNumber.get(l.to);
        if (!a || !b) return null;
        const [p, q] = [at(a), at(b)];
        return (
          <Line
            key={`${l.from}-${l.to}`}
            x1={p.x}
            y1={p.y}
            x2={q.x}
            y2={q.y}
            stroke={l.weak ? colors.accent : colors.muted}
            strokeWidth={1}
            strokeDasharray={l.weak ? '3 2' : undefined}
          />
        );
      })}
      {plan.stations.map((s) => {
        const p = at(s);
        return <Circle key={s.number} cx={p.x} cy={p.y} r={2.5} fill={colors.ink} />;
      })}
    </Svg>
  );
}
