/** Realistic requests against the shipped ruleset, cycled by the bench. */
import type { RankRequest } from '@fuelwright/shared';

export const SHIPPED_REQUESTS: RankRequest[] = [
  { symptoms: ['bog-on-acceleration', 'sporadic-running'], setup: { carburettorKind: 'pump-around', foamFittedDate: '2025-03-01' } },
  { symptoms: [{ id: 'fuel-from-vents', where: 'corner-entry' }], setup: { carburettorKind: 'pump-around', ventLinesFitted: false } },
  { symptoms: ['slow-deceleration', 'high-idle'], setup: { idleScrew: 'set', idleScrewTurns: 1.5 } },
  { symptoms: [{ id: 'lean-top-end', band: 'three-quarters-to-full', where: 'straight' }], setup: { mainJet: 180 }, conditions: { densityChangePct: 4.5 } },
  { symptoms: [{ id: 'bog-on-acceleration', band: ['closed', 'up-to-quarter'] }], setup: { airScrewTurnsOut: 2.75, pilotJet: 35 } },
  { symptoms: [{ id: 'rich-blubber', band: 'three-quarters-to-full' }], conditions: { densityChangePct: -5 }, setup: { mainJet: 190 } },
  { symptoms: ['hard-cold-start'], conditions: { fuelAgeDays: 40 } },
  { symptoms: [{ id: 'cuts-out-in-corners', where: 'corner-exit' }], setup: { carburettorKind: 'pump-around', lastRebuildDate: '2026-11-25' } },
  { symptoms: ['fades-after-laps', 'inconsistent-laps'], results: { 'tank-vent-test': 'looks-fine' } },
  {
    symptoms: ['bog-on-acceleration', 'hesitation'],
    setup: { carburettorKind: 'pump-around', foamFittedDate: '2025-01-10', airScrewTurnsOut: 1.5, ventLinesFitted: true, ventLinesRoutedUp: true },
    results: { 'throttle-return': 'looks-fine', 'foam-inspect': 'looks-fine', 'air-screw-count': 'looks-fine' },
  },
  { symptoms: ['fuel-weeping-at-bowl'], setup: { carburettorKind: 'float-valve' } },
  { symptoms: [{ id: 'stalls-off-throttle', engine: 'warm', where: 'corner-entry' }], setup: { airScrewTurnsOut: 2.5, idleScrew: 'backed-off' } },
].map((r) => ({ asOf: '2026-12-01', ...r }) as RankRequest);
