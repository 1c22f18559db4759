import { View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { LevelAnalysis } from '@/shared/station-analysis';
import { AREA_LABEL, fromMetres, fromSquareMetres, type LengthUnit, roundTo } from '@/shared/units';

// The findings of one level in words (what the plot shows, for everyone and for screen readers).
export function StationFindings({ level, units, maxSpacingM }: { level: LevelAnalysis; units: LengthUnit; maxSpacingM: number | null }) {
  const len = (m: number | null) => (m === null ? '–' : `${roundTo(fromMetres(m, units), 1)} ${units}`);
  const ce = level.clarkEvans;
  const spread = ce === null ? null : ce.r < 0.9 ? 'clustered' : ce.r < 1.3 ? 'about as even as random placement' : 'evenly spread';
  return (
    <View style={{ gap: space.xs }}>
      <Text variant="label">{`Findings: ${level.registered} registered station(s), ${level.panoramas} panorama(s)`}</Text>
      <Text variant="small">{`Nearest-neighbour spacing: mean ${len(level.spacing.mean)}, median ${len(level.spacing.median)}, largest ${len(level.spacing.max)}; limit ${len(maxSpacingM)} for this camera class${level.level === 'exterior' ? ' outdoors' : ''} (common practice).`}</Text>
      <Text variant="small" style={level.sparse.length ? { color: colors.fail, fontFamily: fonts.semibold } : undefined}>
        {level.sparse.length
          ? `Sparse: station(s) ${level.sparse.map((n) => `#${n}`).join(', ')} are farther than the limit from any other station.`
          : 'No sparse stations.'}
      </Text>
      <Text variant="small" style={level.weakLinks.length ? { color: colors.fail, fontFamily: fonts.semibold } : undefined}>
        {level.weakLinks.length
          ? `Weak links: ${level.weakLinks.map((l) => `#${l.station} is ${len(l.distance)} from #${l.from}`).join('; ')}.`
          : 'No weak links in the registration chain.'}
      </Text>
      {ce ? (
        <Text variant="small">{`Clark–Evans index R = ${ce.r.toFixed(2)} (z = ${ce.z.toFixed(2)}): stations are ${spread}. Area used: ${roundTo(fromSquareMetres(ce.areaM2, units), 0)} ${AREA_LABEL[units]}.`}</Text>
      ) : null}
      {level.rooms.map((room) => (
        <Text key={room.room} variant="small" style={room.short ? { color: colors.rework, fontFamily: fonts.semibold } : undefined}>
          {`${room.room}: ${room.stations} station(s)` +
            (room.areaM2 !== null
              ? `, ${roundTo(units === 'm' ? room.perTenSquareMetres! : (room.stations / fromSquareMetres(room.areaM2, 'ft')) * 100, 1)} per ${units === 'm' ? '10 m²' : '100 ft²'}`
              : ', area not in the record') +
            (room.expected !== null ? `; about ${room.expected} expected${room.short ? ' (fewer than expected)' : ''}` : '')}
        </Text>
      ))}
    </View>
  );
}
