import { describe, expect, it } from 'vitest';
import { EMPTY_AIR_FORM, convertAirForm, parseAirForm, parseDecimal } from './air-reading-fields';

const METRIC = { temperature: 'C', pressure: 'hPa', length: 'm' } as const;
const IMPERIAL = { temperature: 'F', pressure: 'inHg', length: 'ft' } as const;

describe('air reading form', () => {
  it('reads numbers written with a point or a comma', () => {
    expect(parseDecimal(' 12,5 ')).toBe(12.5);
    expect(parseDecimal('-3')).toBe(-3);
    expect(parseDecimal('.5')).toBe(0.5);
    expect(parseDecimal('12a')).toBeNull();
    expect(parseDecimal('')).toBeNull();
  });

  it('turns the user’s units into the API’s °C, hPa and metres', () => {
    const station = parseAirForm({ ...EMPTY_AIR_FORM, temperature: '68', humidity: '50', stationPressure: '29.92' }, IMPERIAL);
    // F = C x 9/5 + 32; 1 inHg = 25.4 conventional mmHg = 33.86388640341 hPa (NIST SP 811, appendix B).
    expect(station.reading?.temperatureC).toBeCloseTo(20, 12);
    expect(station.reading?.stationPressureHpa).toBeCloseTo(29.92 * 33.86388640341, 9);
    expect(station.reading?.altitudeM).toBeUndefined();
    const elevation = parseAirForm(
      { ...EMPTY_AIR_FORM, temperature: '10', humidity: '80', pressureMode: 'elevation', elevation: '1000', seaLevelPressure: '30.1' },
      IMPERIAL,
    );
    // 1 ft = 0.3048 m exactly (international foot, 1959).
    expect(elevation.reading?.altitudeM).toBeCloseTo(304.8, 9);
    expect(elevation.reading?.seaLevelPressureHpa).toBeCloseTo(30.1 * 33.86388640341, 9);
    expect(elevation.reading?.stationPressureHpa).toBeUndefined();
  });

  it('names every missing or unreadable field by its API name', () => {
    const r = parseAirForm({ ...EMPTY_AIR_FORM, temperature: 'warm', pressureMode: 'elevation' }, METRIC);
    expect(r.reading).toBeNull();
    expect(Object.keys(r.errors).sort()).toEqual(['altitudeM', 'relativeHumidityPct', 'seaLevelPressureHpa', 'temperatureC']);
    expect(r.errors.temperatureC[0]).toMatch(/must be a number/);
    expect(r.errors.relativeHumidityPct[0]).toMatch(/^Enter/);
  });

  it('keeps what was typed meaning the same when the units change, and round-trips', () => {
    const typed = { ...EMPTY_AIR_FORM, temperature: '20', humidity: '55', stationPressure: '1013.25', elevation: '300', seaLevelPressure: '1020' };
    const imperial = convertAirForm(typed, METRIC, IMPERIAL);
    expect(imperial.temperature).toBe('68.00');
    expect(imperial.humidity).toBe('55');
    // 1013.25 hPa = 29.921 inHg (NIST SP 811 factor above); 300 m = 984.3 ft.
    expect(imperial.stationPressure).toBe('29.921');
    expect(imperial.elevation).toBe('984.3');
    const back = convertAirForm(imperial, IMPERIAL, METRIC);
    expect(Number(back.temperature)).toBeCloseTo(20, 2);
    expect(Number(back.stationPressure)).toBeCloseTo(1013.25, 1);
    expect(Number(back.elevation)).toBeCloseTo(300, 0);
    expect(Number(back.seaLevelPressure)).toBeCloseTo(1020, 1);
    // Text that is not a number is left as it was.
    expect(convertAirForm({ ...typed, temperature: 'x' }, METRIC, IMPERIAL).temperature).toBe('x');
  });
});
