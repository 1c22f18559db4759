import { emptyRoom, toFormValues, toRecord } from '@/components/capture-record/form-values';
import { emptyCaptureRecord } from '@/shared/capture-record';
import { feetToMetres } from '@/shared/units';

describe('capture record form values', () => {
  it('shows metres as feet when the technician works in feet, and stores SI again', () => {
    const record = {
      ...emptyCaptureRecord(),
      units: 'ft' as const,
      rooms: [
        {
          key: 'r1',
          name: 'Kitchen',
          level: 'ground' as const,
          lengthM: feetToMetres(12),
          widthM: feetToMetres(15),
          areaM2: null,
          stations: 5,
          doorwayStation: true,
          reflective: [],
        },
      ],
    };
    const values = toFormValues(record);
    expect(values.rooms[0].length).toBe('12');
    expect(values.rooms[0].width).toBe('15');
    const back = toRecord(values);
    expect(back.errors).toEqual({});
    expect(back.record.rooms[0].lengthM).toBeCloseTo(3.6576, 12); // 12 × 0.3048 m exactly (NIST SP 811)
  });

  it('reports text that is not a number by field, and keeps the rest', () => {
    const values = toFormValues(emptyCaptureRecord());
    values.rooms = [{ ...emptyRoom(), name: 'Den', length: '12a', stations: 'three' }];
    values.totalStations = '4.5';
    const { record, errors } = toRecord(values);
    expect(errors).toEqual({
      'rooms.0.length': 'Enter a number, 0 or more',
      'rooms.0.stations': 'Enter a whole number, 0 or more',
      totalStations: 'Enter a whole number, 0 or more',
    });
    expect(record.rooms[0].name).toBe('Den');
  });

  it('parses station numbers of a damage area from a typed list', () => {
    const values = toFormValues(emptyCaptureRecord());
    values.damageAreas = [
      { key: 'd1', roomKey: 'r1', description: 'Stain', lossType: 'water', stationNumbers: '4, 5 12', photoFileIds: [] },
    ];
    expect(toRecord(values).record.damageAreas[0].stationNumbers).toEqual([4, 5, 12]);
  });

  it('refuses more flagged surfaces than found', () => {
    const values = toFormValues(emptyCaptureRecord());
    const room = emptyRoom();
    room.reflective.mirror = { found: '1', flagged: '2' };
    values.rooms = [room];
    expect(toRecord(values).errors).toEqual({ 'rooms.0.reflective.mirror.flagged': 'Cannot be more than found' });
  });
});
