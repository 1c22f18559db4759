import { useWatch } from 'react-hook-form';

import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { SCALAR_FIELDS } from '@/shared/record-labels';

import { TextInputField } from './controlled';
import { useRecordForm } from './form-context';

export function StationsSection() {
  const { control } = useRecordForm();
  const rooms = useWatch({ control, name: 'rooms' });
  const exterior = useWatch({ control, name: 'exteriorStations' });
  const inRooms = rooms.reduce((sum, r) => sum + (Number.parseInt(r.stations, 10) || 0), 0);
  const sum = inRooms + (Number.parseInt(exterior, 10) || 0);
  return (
    <Section title="Station count" summary={`Rooms ${inRooms} + exterior ${Number.parseInt(exterior, 10) || 0} = ${sum}`}>
      <TextInputField name="exteriorStations" label={SCALAR_FIELDS.exteriorStations.label} numeric="numeric" />
      <TextInputField
        name="totalStations"
        label={SCALAR_FIELDS.totalStations.label}
        hint="Must equal the stations in rooms plus exterior"
        numeric="numeric"
      />
      <Text variant="muted">{`Stations in rooms plus exterior: ${sum}`}</Text>
    </Section>
  );
}
