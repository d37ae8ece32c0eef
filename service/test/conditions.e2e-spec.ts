import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, type TestApp } from './test-app.js';

const AIR = '/api/conditions/air';

describe('POST /api/conditions/air over HTTP', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 1000 });
  });
  afterAll(() => t.close());

  it('answers a visitor (no session) with the air figures', async () => {
    const res = await t.http.post(AIR).send({ temperatureC: 15, stationPressureHpa: 1013.25, relativeHumidityPct: 0 });
    expect(res.status).toBe(200);
    expect(Object.keys(res.body).sort()).toEqual(
      [
        'densityAltitudeM',
        'densityKgM3',
        'dryAirDensityKgM3',
        'powerCorrectionFactor',
        'reference',
        'referenceDensityKgM3',
        'relativeAirDensityPct',
        'saturationVaporPressureHpa',
        'stationPressureHpa',
        'vaporPressureHpa',
        'warnings',
      ].sort(),
    );
    // ISA sea level: 288.15 K, 101 325 Pa, 1.2250 kg/m3 (ICAO Doc 7488/3, ISO 2533). CIPM-2007 treats
    // dry air as a real gas with M_a = 28.96546 g/mol, so it comes out about 0.04 % denser (shared/src/air/README.md).
    expect(res.body.densityKgM3 / 1.225 - 1).toBeGreaterThan(0);
    expect(res.body.densityKgM3 / 1.225 - 1).toBeLessThan(6e-4);
    // Dry air: the dry-air partial density is the whole density and there is no vapour.
    expect(res.body.dryAirDensityKgM3).toBeCloseTo(res.body.densityKgM3, 12);
    expect(res.body.vaporPressureHpa).toBe(0);
    // Density altitude of ISA sea-level air is 0 m, within the real-gas offset of about 4 m (same source).
    expect(Math.abs(res.body.densityAltitudeM)).toBeLessThan(6);
    expect(res.body.relativeAirDensityPct).toBeCloseTo(100, 1);
    expect(res.body.reference).toBe('isa-sea-level');
    expect(res.body.referenceDensityKgM3).toBe(1.225);
    expect(res.body.warnings).toEqual([]);
  });

  it('reports the saturation and partial vapour pressure of humid air', async () => {
    const res = await t.http.post(AIR).send({ temperatureC: 20, stationPressureHpa: 1013.25, relativeHumidityPct: 50 });
    expect(res.status).toBe(200);
    // Saturation vapour pressure of water at 20 C: 2.3392 kPa (CRC Handbook of Chemistry and Physics,
    // "Vapor pressure of water"); CIPM-2007's formula agrees within 0.05 %.
    expect(Math.abs(res.body.saturationVaporPressureHpa / 23.392 - 1)).toBeLessThan(5e-4);
    // e = h f p_sv with the CIPM-2007 enhancement factor f = 1.00062 + 3.14e-8 p + 5.6e-7 t^2 (Picard et al. 2008).
    const f = 1.00062 + 3.14e-8 * 101325 + 5.6e-7 * 20 ** 2;
    expect(res.body.vaporPressureHpa).toBeCloseTo(0.5 * f * res.body.saturationVaporPressureHpa, 9);
    // Water vapour is lighter than air (18.015 against 28.965 g/mol, CIPM-2007), so the dry part is less than the whole.
    expect(res.body.dryAirDensityKgM3).toBeLessThan(res.body.densityKgM3);
    // SAE J1349 (JUN1990 equation): CF = 1.18 (99/Pd) sqrt((t+273)/298) - 0.18, Pd = dry-air pressure in kPa.
    const pd = (1013.25 - res.body.vaporPressureHpa) / 10;
    expect(res.body.powerCorrectionFactor).toBeCloseTo(1.18 * (99 / pd) * Math.sqrt(293 / 298) - 0.18, 9);
  });

  it('takes the track elevation and sea-level pressure instead of the station pressure', async () => {
    const atSea = await t.http.post(AIR).send({ temperatureC: 15, altitudeM: 0, seaLevelPressureHpa: 1013.25, relativeHumidityPct: 40 });
    expect(atSea.status).toBe(200);
    // With QNH = 1013.25 hPa at sea level the station pressure is the ISA sea-level pressure (ICAO definition of QNH).
    expect(atSea.body.stationPressureHpa).toBeCloseTo(1013.25, 9);
    const up = await t.http.post(AIR).send({ temperatureC: 8.5, altitudeM: 1000, seaLevelPressureHpa: 1013.25, relativeHumidityPct: 40 });
    expect(up.status).toBe(200);
    // ISA at 1000 m geometric: 89 876 Pa (U.S. Standard Atmosphere 1976 table, from memory; ICAO's 89 874.6 Pa is at 1000 m geopotential).
    expect(up.body.stationPressureHpa).toBeCloseTo(898.76, 1);
    // 1000 m and 1013.25 hPa are inside the ranges of the pressure law: only the J1349 factor warns (cold, thin air).
    expect(up.body.warnings.every((w: string) => w.startsWith('Power correction factor'))).toBe(true);
  });

  it('measures relative air density against a baseline day when asked', async () => {
    const res = await t.http
      .post(AIR)
      .send({ temperatureC: 25, stationPressureHpa: 990, relativeHumidityPct: 60, reference: { kind: 'baseline', densityKgM3: 1.2 } });
    expect(res.status).toBe(200);
    expect(res.body.reference).toBe('baseline');
    expect(res.body.relativeAirDensityPct).toBeCloseTo((100 * res.body.densityKgM3) / 1.2, 10);
  });

  it('still answers outside the formulas’ ranges, with warnings', async () => {
    const hot = await t.http.post(AIR).send({ temperatureC: 58, stationPressureHpa: 1000, relativeHumidityPct: 20 });
    expect(hot.status).toBe(200);
    expect(hot.body.warnings.join(' ')).toMatch(/temperature 58\.0 C is outside/);
    const low = await t.http.post(AIR).send({ temperatureC: 10, stationPressureHpa: 550, relativeHumidityPct: 20 });
    expect(low.status).toBe(200);
    expect(low.body.warnings.join(' ')).toMatch(/station pressure 550\.0 hPa is outside/);
  });

  it('refuses what cannot be air with 400 naming the field', async () => {
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [{ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 120 }, 'relativeHumidityPct', /from 0 to 100/],
      [{ temperatureC: 'warm', stationPressureHpa: 1000, relativeHumidityPct: 50 }, 'temperatureC', /in the shade/],
      [{ temperatureC: -300, stationPressureHpa: 1000, relativeHumidityPct: 50 }, 'temperatureC', /absolute zero/],
      [{ temperatureC: 20, relativeHumidityPct: 50 }, 'stationPressureHpa', /barometer/],
      [{ temperatureC: 20, altitudeM: 300, relativeHumidityPct: 50 }, 'seaLevelPressureHpa', /weather report/],
      [{ temperatureC: 20, stationPressureHpa: -5, relativeHumidityPct: 50 }, 'stationPressureHpa', /above 0/],
      [{ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50, reference: { kind: 'baseline' } }, 'reference.densityKgM3', /baseline day/],
      [{ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50, reference: { kind: 'yesterday' } }, 'reference.kind', /isa-sea-level/],
      [{ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50, windKph: 12 }, 'windKph', /not a field/],
    ];
    for (const [body, field, message] of cases) {
      const res = await t.http.post(AIR).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.fields), JSON.stringify(body)).toEqual([field]);
      expect(res.body.fields[field].join(' ')).toMatch(message);
    }
  });

  it('is described in the OpenAPI document', async () => {
    const doc = (await t.http.get('/api/docs/openapi.json')).body;
    const op = doc.paths['/api/conditions/air'].post;
    expect(op.responses['200']).toBeDefined();
    expect(op.responses['400']).toBeDefined();
    const schemas = doc.components.schemas;
    expect(Object.keys(schemas.AirRequestDto.properties)).toEqual(
      expect.arrayContaining(['temperatureC', 'relativeHumidityPct', 'stationPressureHpa', 'altitudeM', 'seaLevelPressureHpa', 'reference']),
    );
    expect(schemas.AirRequestDto.required.sort()).toEqual(['relativeHumidityPct', 'temperatureC']);
    expect(Object.keys(schemas.AirResponseDto.properties)).toEqual(
      expect.arrayContaining(['densityKgM3', 'dryAirDensityKgM3', 'vaporPressureHpa', 'densityAltitudeM', 'relativeAirDensityPct', 'powerCorrectionFactor', 'warnings']),
    );
  });
});

describe('POST /api/conditions/air rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 3 });
  });
  afterAll(() => t.close());

  it('answers 429 once a visitor exceeds the limit', async () => {
    const body = { temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50 };
    const agent = request(t.app.getHttpServer());
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await agent.post(AIR).send(body)).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
  });
});
