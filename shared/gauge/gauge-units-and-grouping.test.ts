import { describe, expect, it } from 'vitest';
import { escapeCsvCell } from './escape-csv-cell';
import { groupSpotsAndAreas } from './group-spots-and-areas';
import { detectReadingMapping, readReadingRows, unitFromHeader } from './read-reading-rows';
import { dryThicknessFromWet, thinnedVolumeSolids, wetThicknessFromDry } from './wet-dry';

const MIL = 25.4e-6; // 1 mil = 0.001 in = 25.4 µm exactly (NIST SP 811, 2008, App. B; 1 in = 0.0254 m by definition)

describe('wet and dry thickness through volume solids', () => {
  it('DFT = WFT × VS and VS′ = VS/(1 + T) (DOMAIN §5: common practice; thinning derived, volumes additive)', () => {
    // 100 µm wet of a 60 % volume-solids coat thinned 20 %: VS′ = 0.6/1.2 = 0.5 → 50 µm dry (hand calculation).
    expect(thinnedVolumeSolids(0.6, 0.2)).toBeCloseTo(0.5, 12);
    expect(dryThicknessFromWet(100e-6, 0.6, 0.2)).toBeCloseTo(50e-6, 15);
    expect(wetThicknessFromDry(50e-6, 0.6, 0.2)).toBeCloseTo(100e-6, 15);
    // Unthinned: 4 mil wet at 50 % → 2 mil dry.
    expect(dryThicknessFromWet(4 * MIL, 0.5) / MIL).toBeCloseTo(2, 12);
  });
  it('refuses impossible volume solids', () => {
    expect(() => thinnedVolumeSolids(0, 0)).toThrow(/volumeSolids/);
    expect(() => thinnedVolumeSolids(1.2, 0)).toThrow(/volumeSolids/);
    expect(() => thinnedVolumeSolids(0.5, -0.1)).toThrow(/thinner/);
  });
});

describe('SSPC-PA 2 spots and areas', () => {
  // SSPC-PA 2 (SSPC): spot = mean of ≥ 3 readings, area = 5 spots; spot limits 80 % of min and 120 % of max
  // (restriction level — verify). Worked example in DOMAIN §6 [32]: 8–12 mil → 6.4–14.4 mil.
  const spec = { minimum: 8 * MIL, maximum: 12 * MIL };

  it('turns an 8–12 mil specification into 6.4–14.4 mil spot limits', () => {
    const grouping = groupSpotsAndAreas([], spec);
    expect(grouping.spotLimits.minimum! / MIL).toBeCloseTo(6.4, 12);
    expect(grouping.spotLimits.maximum! / MIL).toBeCloseTo(14.4, 12);
  });

  it('groups 16 readings into 5 spots of 3, one area of 5 spots, one reading left over', () => {
    const mils = [10, 10, 10, 7, 6, 5, 14, 15, 16, 9, 9, 9, 11, 11, 11, 10];
    const readings = mils.map((m, i) => ({ id: i + 1, thickness: m * MIL }));
    const grouping = groupSpotsAndAreas(readings, spec);
    expect(grouping.spots).toHaveLength(5);
    expect(grouping.spots.map((s) => s.mean / MIL).map((x) => Number(x.toFixed(9)))).toEqual([10, 6, 15, 9, 11]);
    // 6 mil < 6.4 mil → below; 15 mil > 14.4 mil → above; a 5 mil single reading inside a passing spot does not fail it.
    expect(grouping.spots.map((s) => s.verdict)).toEqual(['within', 'below', 'above', 'within', 'within']);
    expect(grouping.areas).toHaveLength(1);
    expect(grouping.areas[0].mean / MIL).toBeCloseTo(10.2, 9);
    expect(grouping.areas[0].verdict).toBe('within');
    expect(grouping.areas[0].complete).toBe(true);
    expect(grouping.leftoverReadingIds).toEqual([16]);
  });

  it('refuses spots of fewer than 3 readings', () => {
    expect(() => groupSpotsAndAreas([], spec, { readingsPerSpot: 2 })).toThrow(/readingsPerSpot/);
  });
});

describe('reading rows', () => {
  it('reads units from headers and converts mil, µm, mm, °F and °C exactly (NIST SP 811, App. B)', () => {
    expect(unitFromHeader('thickness [µm]')).toBe('µm');
    expect(unitFromHeader('T air (°F)')).toBe('°F');
    expect(unitFromHeader('run')).toBeNull();
    const headers = ['Run', 'Position [m]', 'WFT [mil]', 'Substrate [°F]', 'Air [°C]'];
    const mapping = detectReadingMapping(headers);
    expect(mapping.columns).toMatchObject({ run: 'Run', position: 'Position [m]', thickness: 'WFT [mil]', substrateTemperature: 'Substrate [°F]', airTemperature: 'Air [°C]' });
    const result = readReadingRows(headers, [['R1', '12.5', '1', '68', '20']], mapping, { kind: 'wet' });
    expect(result.errors).toEqual([]);
    const [reading] = result.readings;
    expect(reading.wetThickness / 25.4e-6).toBeCloseTo(1, 12);
    // 68 °F = (68 + 459.67)/1.8 K = 293.15 K; 20 °C = 293.15 K (NIST SP 811 §B.8)
    expect(reading.substrateTemperature).toBeCloseTo(293.15, 9);
    expect(reading.airTemperature).toBeCloseTo(293.15, 9);
    expect(reading.enteredThickness).toBe(1);
    expect(reading.enteredUnit).toBe('mil');
    const mm = readReadingRows(['run', 'pos', 'd'], [['R1', '1', '0.125']], { columns: { run: 'run', position: 'pos', thickness: 'd' }, units: { thickness: 'mm' } }, { kind: 'wet' });
    expect(mm.readings[0].wetThickness).toBeCloseTo(125e-6, 15);
  });

  it('converts dry readings to wet through volume solids', () => {
    const mapping = { columns: { run: 'run', position: 'pos', thickness: 'dft [µm]' }, units: {} };
    const result = readReadingRows(['run', 'pos', 'dft [µm]'], [['R1', '0', '50']], mapping, { kind: 'dry', volumeSolids: 0.6, thinner: 0.2 });
    expect(result.readings[0].wetThickness).toBeCloseTo(100e-6, 15);
  });

  it('names the line and column of every bad cell and accepts none of the file', () => {
    const headers = ['run', 'pos [m]', 'thickness [µm]', 'dir', 'time'];
    const rows = [
      ['R1', '0.0', '80', 'MD', '2026-03-05T10:00:00Z'],
      ['R1', 'abc', '80', 'MD', ''],
      ['', '1.0', '80', 'CD', ''],
      ['R1', '2.0', '-5', 'XX', ''],
      ['R1', '3.0', '80', 'MD', '2026-03-05 10:00'],
      [''],
      ['R1', '4.0'],
    ];
    const result = readReadingRows(headers, rows, detectReadingMapping(headers), { kind: 'wet' });
    expect(result.errors.map((e) => [e.line, e.column])).toEqual([
      [3, 'pos [m]'],
      [4, 'run'],
      [5, 'thickness [µm]'],
      [5, 'dir'],
      [6, 'time'],
      [8, null],
    ]);
    expect(result.errorCount).toBe(6);
  });

  it('asks for a thickness unit when neither the header nor the person gives one', () => {
    const result = readReadingRows(['run', 'pos', 'thickness'], [['R1', '0', '80']], { columns: { run: 'run', position: 'pos', thickness: 'thickness' }, units: {} }, { kind: 'wet' });
    expect(result.mappingErrors['units.thickness']).toMatch(/choose the unit/);
    const wrong = readReadingRows(['run', 'pos', 'thickness'], [['R1', '0', '80']], { columns: { run: 'run', position: 'pos', thickness: 'thickness' }, units: { thickness: 'kg' } }, { kind: 'wet' });
    expect(wrong.mappingErrors['units.thickness']).toMatch(/not a unit of length|unknown unit/);
  });
});

describe('CSV formula-injection escaping', () => {
  // OWASP "CSV Injection": cells starting with = + - @ (and tab, CR) are prefixed with an apostrophe.
  it.each(['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\t=x', '\r=x'])('escapes %j', (cell) => {
    expect(escapeCsvCell(cell)).toBe(`'${cell}`);
  });
  it('leaves ordinary text alone', () => {
    expect(escapeCsvCell('Run 7 – Line 2')).toBe('Run 7 – Line 2');
    expect(escapeCsvCell('')).toBe('');
  });
});
