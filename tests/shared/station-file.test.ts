import { parseStationFile } from '../../shared/station-file';

describe('parseStationFile', () => {
  it('reads stations and converts feet to metres exactly (1 ft = 0.3048 m, NIST SP 811)', () => {
    const { stations, problems } = parseStationFile(
      'station,level,x,y,unit,room,kind\n1,ground,0,0,ft,Kitchen,station\n2,ground,6,10,ft,Kitchen,station\n3,upper,1.5,2,m,,panorama\n',
    );
    expect(problems).toEqual([]);
    expect(stations[1]).toMatchObject({ number: 2, level: 'ground', room: 'Kitchen', kind: 'station' });
    // Floating point: 6 × 0.3048 is 1.8288 to within one unit in the last place.
    expect(stations[1].x).toBeCloseTo(1.8288, 12);
    expect(stations[1].y).toBeCloseTo(3.048, 12);
    expect(stations[2]).toEqual({ number: 3, level: 'upper', x: 1.5, y: 2, room: null, kind: 'panorama' });
  });

  it('names every bad row by line and column, and accepts nothing', () => {
    const text = [
      'station,level,x,y,unit,room,kind',
      '1,ground,0,0,ft,Hall,station',
      '2,ground,,3,ft,Hall,station',
      '3,ground,four,3,ft,Hall,station',
      '1,ground,1,1,ft,Hall,station',
      '4,ground,1,1,yd,Hall,station',
      '5,garage,1,1,m,,tripod',
    ].join('\n');
    const { stations, problems } = parseStationFile(text);
    expect(stations).toEqual([]);
    expect(problems).toEqual([
      { line: 3, column: 'x', message: 'Missing value' },
      { line: 4, column: 'x', message: 'Not a number: "four"' },
      { line: 5, column: 'station', message: 'Duplicate station number 1 (first on line 2)' },
      { line: 6, column: 'unit', message: 'Unknown unit "yd" (use ft or m)' },
      { line: 7, column: 'level', message: 'Unknown level "garage"' },
      { line: 7, column: 'kind', message: 'Unknown kind "tripod" (use station or panorama)' },
    ]);
  });

  it('reports a missing column on the header line', () => {
    expect(parseStationFile('station,level,x,unit,kind\n1,ground,0,ft,station\n').problems).toEqual([
      { line: 1, column: 'y', message: 'The header has no "y" column' },
    ]);
  });
});
