import type { CheckResultValue, SetupSnapshot, SymptomReport } from '@fuelwright/shared';

/**
 * INVENTED DEMO HISTORY, written through the app's own commands after the demo club is seeded on an
 * empty database (see DemoHistory). The people and karts are those of fixtures/demo-club.json; the
 * cases, notes and fix below are made up to show the product, and are no check value for any test
 * of the trade.
 */
export const DEMO_HISTORY = {
  racer: 'racer@fuelwright.test',
  racer2: 'racer2@fuelwright.test',
  coach: 'coach@fuelwright.test',
  shop: 'shop@fuelwright.test',
  /** Resolved a few days ago on the racer's pump-around shifter; the shop logs the outcome. */
  resolved: {
    kart: 'Blue 27',
    symptoms: [
      { id: 'bog-on-acceleration', band: 'quarter-to-three-quarters', engine: 'warm', where: 'corner-exit' },
      { id: 'hesitation', band: 'quarter-to-three-quarters', engine: 'warm', where: 'corner-exit' },
    ] satisfies SymptomReport[],
    checks: [
      { checkId: 'vent-lines-look', result: 'looks-fine', note: 'Both vent lines on and routed up (demo).' },
      { checkId: 'foam-inspect', result: 'fault-found', note: 'Foam blocks crumbling and shedding bits into the bowl (demo).' },
    ] satisfies { checkId: string; result: CheckResultValue; note: string }[],
    causeId: 'foam-degraded',
    fix: 'Replaced the bowl foam blocks and flushed the bowl',
    note: 'Clean off the corners again after the new foam (invented demo entry).',
    outcome: { fix: 'Bowl foam replaced, bowl flushed', parts: 'Bowl foam set', labourMinutes: 30, stillFixed: true },
  },
  /** Still open on the racer's practice kart, shared with the demo coach, who asks for the plug. */
  open: {
    kart: 'Practice chassis',
    symptoms: [
      { id: 'hard-cold-start' },
      { id: 'rich-blubber', band: 'closed', engine: 'cold' },
    ] satisfies SymptomReport[],
    check: { checkId: 'choke-position', result: 'looks-fine', note: 'Choke fully off once it caught (demo).' } as { checkId: string; result: CheckResultValue; note: string },
    comment: 'Can you pull the plug after a few minutes at idle and post a photo of it? A wet, black plug would point at the low-speed circuit.',
    photo: { what: 'The spark plug after a few minutes at idle', checkId: 'plug-reads-rich' },
  },
  /** The second racer's kart, shared with the demo shop, which has it in on an open work order. */
  shopOpen: {
    kart: 'Yellow 8',
    symptoms: [
      { id: 'fades-after-laps', band: 'three-quarters-to-full', where: 'straight' },
      { id: 'cuts-out-in-corners', band: 'quarter-to-three-quarters', where: 'corner-exit' },
    ] satisfies SymptomReport[],
    notes: 'Fades after five or six laps and cuts out in the long corners; bowl to come off, float height and float valve to be looked at (invented demo entry).',
  },
  /** A walk-in the demo shop finished: the idle screw held the slide open. */
  shopDone: {
    customerName: 'Walk-in customer (invented)',
    kartDescription: '100 cc direct-drive, float-valve',
    symptoms: [
      { id: 'slow-deceleration', where: 'corner-entry' },
      { id: 'high-idle', engine: 'warm' },
    ] satisfies SymptomReport[],
    setup: { carburettorKind: 'float-valve' } satisfies SetupSnapshot,
    notes: 'Hangs revs on corner entry and idles high once warm (invented demo entry).',
    outcome: { confirmedCauses: ['idle-screw-set'], fix: 'Idle screw found set in two turns, backed off until the slide closes on its stop', labourMinutes: 15, stillFixed: true },
  },
} as const;
