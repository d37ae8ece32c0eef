/**
 * Realistic ranking scenarios: what a racer reports, and what an experienced mechanic would look
 * at first. Source for every expectation here: common practice, no published source.
 */
import { describe, expect, it } from 'vitest';
import { ids, prob, rank, rankOf } from './test-support/shipped.js';

describe('ranking scenarios (common practice, no published source)', () => {
  it('bogging and sporadic running on a pump-around with two-year-old foam: the foam first', async () => {
    const res = await rank({
      symptoms: [{ id: 'bog-on-acceleration', where: 'corner-exit' }, 'sporadic-running'],
      setup: { carburettorKind: 'pump-around', foamFittedDate: '2024-11-20' },
    });
    expect(ids(res, 1)).toEqual(['foam-degraded']);
    expect(prob(res, 'foam-degraded')).toBeGreaterThan(0.4);
    expect(res.plan.find((s) => s.checkId === 'foam-inspect')).toBeDefined();
  });

  it('fuel from the vents and no vent lines fitted: the vent lines first', async () => {
    const res = await rank({ symptoms: [{ id: 'fuel-from-vents', where: ['corner-entry', 'braking'] }], setup: { carburettorKind: 'pump-around', ventLinesFitted: false } });
    expect(ids(res, 1)).toEqual(['vent-lines-off']);
    expect(res.plan.slice(0, 3).map((s) => s.checkId)).toContain('vent-lines-look');
  });

  it('slow to slow down and a high idle with the idle screw set: the idle screw first', async () => {
    const res = await rank({ symptoms: ['slow-deceleration', 'high-idle'], setup: { idleScrew: 'set', idleScrewTurns: 1.5 } });
    expect(ids(res, 1)).toEqual(['idle-screw-set']);
    expect(prob(res, 'idle-screw-set')).toBeGreaterThan(0.8);
  });

  it('a high idle with the idle screw backed off: an intake leak or the slide, not the idle screw', async () => {
    const res = await rank({ symptoms: ['high-idle'], setup: { idleScrew: 'backed-off' } });
    expect(['intake-air-leak', 'slide-sticking-or-misfitted']).toContain(res.causes[0].id);
    expect(rankOf(res, 'idle-screw-set')).toBeGreaterThan(2);
  });

  it('lean at the top on the straight with denser air: main jet and air density, and the plug read early', async () => {
    const res = await rank({
      symptoms: [{ id: 'lean-top-end', band: 'three-quarters-to-full', where: 'straight' }],
      setup: { mainJet: 180 },
      conditions: { densityChangePct: 4.5 },
    });
    expect(ids(res, 2).sort()).toEqual(['air-density-changed', 'main-jet-too-small']);
    expect(res.plan.slice(0, 2).map((s) => s.checkId)).toContain('plug-reads-lean');
    expect(res.cautions.map((c) => c.id)).toContain('lean-seizure');
  });

  it('pinging with much denser air: lean causes first, and the plug and piston looked at before anything else', async () => {
    const res = await rank({ symptoms: [{ id: 'pinging-or-detonation', band: 'three-quarters-to-full' }], conditions: { densityChangePct: 6 } });
    expect(ids(res, 2).sort()).toEqual(['air-density-changed', 'main-jet-too-small']);
    const first = res.plan.filter((s) => s.safetyFirst).map((s) => s.checkId);
    expect(first.sort()).toEqual(['piston-look', 'plug-reads-lean', 'throttle-return']);
    expect(res.plan.slice(0, 3).every((s) => s.safetyFirst)).toBe(true);
  });

  it('throttle slow to return: slide or cable retainer, the throttle check first, and the stop caution shown', async () => {
    const res = await rank({ symptoms: ['throttle-slow-to-return'] });
    expect(ids(res, 2).sort()).toEqual(['cable-retainer-missing', 'slide-sticking-or-misfitted']);
    expect(res.plan[0].checkId).toBe('throttle-return');
    expect(res.cautions[0]).toMatchObject({ id: 'throttle-stop', severity: 'stop' });
  });

  it('fuel weeping at the bowl: the gasket first, and fuel near hot parts looked for first', async () => {
    const res = await rank({ symptoms: ['fuel-weeping-at-bowl'], setup: { carburettorKind: 'pump-around' } });
    expect(ids(res, 1)).toEqual(['bowl-gasket-or-screws-leaking']);
    expect(res.plan.filter((s) => s.safetyFirst).map((s) => s.checkId)).toContain('fuel-leak-look');
    expect(res.cautions.map((c) => c.id)).toEqual(['fuel-leak-stop', 'fuel-flammable']);
  });

  it('hard to start cold: the choke first', async () => {
    const res = await rank({ symptoms: ['hard-cold-start'] });
    expect(ids(res, 1)).toEqual(['choke-not-used-cold']);
  });

  it('fading after some laps: the fuel supply (tank vent, filter, pump)', async () => {
    const res = await rank({ symptoms: [{ id: 'fades-after-laps', where: 'straight' }] });
    expect(['tank-vent-blocked', 'fuel-filter-blocked', 'fuel-pump-weak']).toEqual(expect.arrayContaining(ids(res, 3)));
  });

  it('dying off throttle with the air screw 2.5 turns out: the air screw first', async () => {
    const res = await rank({ symptoms: [{ id: 'stalls-off-throttle', engine: 'warm', where: 'corner-entry' }], setup: { airScrewTurnsOut: 2.5, idleScrew: 'backed-off' } });
    expect(ids(res, 1)).toEqual(['air-screw-too-far-out']);
  });

  it('hesitation only between 1/4 and 3/4: the needle clip first, the main jet well down', async () => {
    const res = await rank({ symptoms: [{ id: 'hesitation', band: 'quarter-to-three-quarters' }] });
    expect(ids(res, 1)).toEqual(['needle-clip-wrong-groove']);
    expect(rankOf(res, 'main-jet-too-small')).toBeGreaterThan(4);
  });

  it('fuel from the vents on a float-valve carburettor with good vent lines: the float valve first', async () => {
    const res = await rank({ symptoms: ['fuel-from-vents'], setup: { carburettorKind: 'float-valve', ventLinesFitted: true, ventLinesRoutedUp: true } });
    expect(ids(res, 1)).toEqual(['float-valve-stuck-or-worn']);
    expect(ids(res)).not.toContain('return-tube-loose');
  });

  it('rich and hard to restart warm on a pump-around: fuel level or choke', async () => {
    const res = await rank({ symptoms: [{ id: 'rich-blubber', engine: 'warm' }, 'hard-warm-start'], setup: { carburettorKind: 'pump-around' } });
    expect(ids(res, 2).sort()).toEqual(['choke-left-on', 'fuel-level-high']);
  });

  it('cutting out on corner exit on a pump-around: the bowl (foam, splash plate, fuel level)', async () => {
    const res = await rank({ symptoms: [{ id: 'cuts-out-in-corners', where: 'corner-exit' }], setup: { carburettorKind: 'pump-around' } });
    expect(['foam-degraded', 'splash-plate-bent', 'fuel-level-low']).toEqual(expect.arrayContaining(ids(res, 3)));
  });

  it('a bog from 1/8 to 1/4 just after a rebuild with new foam: the slide first (cutaway or fitted the wrong way round)', async () => {
    const res = await rank({
      symptoms: [{ id: 'bog-on-acceleration', band: 'up-to-quarter' }],
      setup: { carburettorKind: 'pump-around', lastRebuildDate: '2026-11-28', foamFittedDate: '2026-11-28' },
    });
    expect(['slide-sticking-or-misfitted', 'slide-cutaway-wrong']).toContain(res.causes[0].id);
  });

  it('bogs only while the engine is cold: the choke first', async () => {
    const res = await rank({ symptoms: [{ id: 'bog-on-acceleration', engine: 'cold' }] });
    expect(ids(res, 1)).toEqual(['choke-not-used-cold']);
  });

  it('rich low down but lean at the top: two circuits out (air screw or pilot, and main jet), not the air', async () => {
    const res = await rank({ symptoms: ['lean-top-end', { id: 'rich-blubber', band: 'closed' }], conditions: { densityChangePct: 0.5 } });
    expect(ids(res, 2).sort()).toEqual(['air-screw-too-far-in', 'main-jet-too-small']);
    expect(rankOf(res, 'air-density-changed')).toBeGreaterThan(3);
  });

  it('only "inconsistent laps": no cause is confidently singled out', async () => {
    const res = await rank({ symptoms: ['inconsistent-laps'] });
    expect(res.causes[0].probability).toBeLessThan(0.2);
    expect(res.somethingElse.probability).toBeGreaterThan(res.causes[0].probability);
  });
});

describe('walking the plan: belief updates and re-planning after each result', () => {
  it('foam looks fine, then the return tube is found loose', async () => {
    const base = { symptoms: ['bog-on-acceleration', 'sporadic-running'], setup: { carburettorKind: 'pump-around' as const, foamFittedDate: '2025-06-01' } };
    const first = await rank(base);
    expect(ids(first, 1)).toEqual(['foam-degraded']);
    expect(first.plan[0].checkId).toBe('throttle-return');

    const second = await rank({ ...base, results: { 'throttle-return': 'looks-fine', 'foam-inspect': 'looks-fine' } });
    expect(prob(second, 'foam-degraded')).toBeLessThan(prob(first, 'foam-degraded') / 3);
    expect(second.plan.map((s) => s.checkId)).not.toContain('foam-inspect');
    expect(second.plan.map((s) => s.checkId)).not.toContain('throttle-return');
    const foam = second.causes.find((c) => c.id === 'foam-degraded')!;
    expect(foam.reasons.find((r) => r.kind === 'check')).toMatchObject({ checkId: 'foam-inspect', text: 'Bowl foam present and springy: looks fine' });
    // The float bowl is still open from the foam check, so the other bowl checks now cost no opening.
    const bowlSteps = second.plan.filter((s) => s.group === 'float-bowl');
    expect(bowlSteps.length).toBeGreaterThan(0);

    const third = await rank({ ...base, results: { 'throttle-return': 'looks-fine', 'foam-inspect': 'looks-fine', 'return-tube-inspect': 'fault-found' } });
    expect(ids(third, 1)).toEqual(['return-tube-loose']);
    expect(prob(third, 'return-tube-loose')).toBeGreaterThan(prob(second, 'return-tube-loose') * 5);
    expect(third.plan.map((s) => s.checkId)).not.toContain('return-tube-inspect');
    expect(third.causes[0].fixes).toEqual(['refit-return-tube']);
  });

  it('a check that could not be done leaves the belief alone and leaves the plan', async () => {
    const base = { symptoms: ['fuel-from-vents'] };
    const before = await rank(base);
    const after = await rank({ ...base, results: { 'vent-lines-look': 'not-checked' } });
    expect(after.causes.map((c) => [c.id, c.probability])).toEqual(before.causes.map((c) => [c.id, c.probability]));
    expect(after.plan.map((s) => s.checkId)).not.toContain('vent-lines-look');
  });
});
