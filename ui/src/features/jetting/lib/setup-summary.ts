/**
 * How the jetting screen names a setup snapshot: its date and its main jet and needle clip, written
 * as the kart page's past-setups table writes them ("Main jet 182.5", "Clip groove 3 from top").
 */
import type { SetupDto, SetupValues } from '@fuelwright/shared';
import { formatCalendarDate } from '../../../lib/setup-fields';

/** "main jet 182.5, clip groove 3 from top"; "no jets recorded" when it has neither. */
export function setupJetSummary(setup: Pick<SetupValues, 'mainJet' | 'needleClipGroove'>): string {
  const parts: string[] = [];
  if (setup.mainJet != null) parts.push(`main jet ${setup.mainJet}`);
  if (setup.needleClipGroove != null) parts.push(`clip groove ${setup.needleClipGroove} from top`);
  return parts.length > 0 ? parts.join(', ') : 'no jets recorded';
}

/** "21 Nov 2026: main jet 182.5, clip groove 3 from top". */
export function setupLabel(setup: Pick<SetupDto, 'takenOn' | 'mainJet' | 'needleClipGroove'>): string {
  return `${formatCalendarDate(setup.takenOn)}: ${setupJetSummary(setup)}`;
}

/**
 * "21 Nov 2026 · main 182.5 · clip 3": short enough for a closed select on a 390 px phone (the
 * full wording sits under the select).
 */
export function setupOptionLabel(setup: Pick<SetupDto, 'takenOn' | 'mainJet' | 'needleClipGroove'>): string {
  const parts = [formatCalendarDate(setup.takenOn)];
  if (setup.mainJet != null) parts.push(`main ${setup.mainJet}`);
  if (setup.needleClipGroove != null) parts.push(`clip ${setup.needleClipGroove}`);
  if (parts.length === 1) parts.push('no jets recorded');
  return parts.join(' · ');
}

/** The jet fields of the session form a setup fills, as text; '' where the setup does not record one. */
export interface JetTexts {
  mainJet: string;
  pilotJet: string;
  needleClipGroove: string;
  airScrewTurnsOut: string;
}

export const JET_FIELDS = ['mainJet', 'pilotJet', 'needleClipGroove', 'airScrewTurnsOut'] as const satisfies readonly (keyof JetTexts)[];

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

/**
 * The jets the form starts from: the setup's where it records them, else the latest session's
 * (the setup the session ran is what it ran, so its jets come first).
 */
export function jetTextsFrom(
  setup: Pick<SetupValues, 'mainJet' | 'pilotJet' | 'needleClipGroove' | 'airScrewTurnsOut'> | undefined,
  latest: { mainJet: number; pilotJet: number | null; needleClipGroove: number | null; airScrewTurnsOut: number | null } | undefined,
): JetTexts {
  const pick = (field: keyof JetTexts) => text(setup?.[field]) || text(latest?.[field]);
  return { mainJet: pick('mainJet'), pilotJet: pick('pilotJet'), needleClipGroove: pick('needleClipGroove'), airScrewTurnsOut: pick('airScrewTurnsOut') };
}
