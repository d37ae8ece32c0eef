/**
 * How a setup snapshot reads on screen: the name of each field in trade words, a short
 * explanation of what it is and where to find it on the carburettor, and how its value is
 * written. Shared by the karts screens (record and list setups) and the case page (the setup at
 * the time of a case).
 */
import {
  IDLE_SCREW_STATE_LABELS,
  SETUP_FIELDS,
  type SetupField,
  type SetupSnapshot,
} from '@fuelwright/shared';

/** Fields a racer records (the carburettor kind belongs to the kart, not to a snapshot). */
export type RecordedSetupField = Exclude<SetupField, 'carburettorKind'>;

/** In display order. */
export const RECORDED_SETUP_FIELDS: readonly RecordedSetupField[] = SETUP_FIELDS.filter((f): f is RecordedSetupField => f !== 'carburettorKind');

export const SETUP_FIELD_LABELS: Record<SetupField, string> = {
  carburettorKind: 'Carburettor',
  mainJet: 'Main jet',
  pilotJet: 'Pilot jet',
  needleClipGroove: 'Needle clip groove',
  airScrewTurnsOut: 'Air screw',
  idleScrew: 'Idle screw',
  idleScrewTurns: 'Idle screw turns',
  foamFittedDate: 'Foam fitted',
  lastRebuildDate: 'Last rebuild',
  premixRatio: 'Premix ratio',
  ventLinesFitted: 'Vent lines fitted',
  ventLinesRoutedUp: 'Vent lines routed up',
};

/** Short column headings for tables. */
export const SETUP_FIELD_SHORT_LABELS: Record<SetupField, string> = {
  ...SETUP_FIELD_LABELS,
  needleClipGroove: 'Clip groove',
  idleScrewTurns: 'Idle turns',
  ventLinesFitted: 'Vents fitted',
  ventLinesRoutedUp: 'Vents up',
};

/**
 * What each field is and where to find it, in plain words. (Slide-carburettor anatomy as general
 * workshop practice describes it; common practice, no published source.)
 */
export const SETUP_FIELD_HINTS: Record<RecordedSetupField, string> = {
  mainJet:
    'The number stamped on the main jet: the larger brass jet screwed into the middle of the float bowl (take the bowl off to read it). It meters fuel from 3/4 to full throttle; a bigger number is richer.',
  pilotJet:
    'The number stamped on the pilot (slow) jet: the small jet beside the main jet under the bowl. It meters fuel from closed to about 1/8 throttle; sizes often go in steps of 2.5.',
  needleClipGroove:
    'Take the carburettor top off and lift out the slide: the needle hangs from it with a small clip in one of its grooves. Count the grooves from the top of the needle (1 = top groove). A lower groove lifts the needle and richens 1/4 to 3/4 throttle.',
  airScrewTurnsOut:
    'The small slotted screw on the side of the carburettor body, low down near the bowl (not the idle screw with the spring). Screw it in gently, counting, until it just seats, then back it out the same count. Quarter turns are fine (1.75 = one and three quarters).',
  idleScrew:
    'The idle (slide stop) screw is the larger screw with a spring that pushes against the slide. Backed off: it does not touch the slide, so the slide closes fully. Set: it holds the slide a little open for an idle.',
  idleScrewTurns:
    'Turns in from where the idle screw just touches the slide. 0 when it is backed off.',
  foamFittedDate:
    'The day new foam blocks went into the float bowl. Pump-around bowls hold foam to stop the fuel sloshing and frothing; leave empty on a float-valve carburettor.',
  lastRebuildDate:
    'The last time the carburettor was stripped and rebuilt: new gaskets, needle and clip, everything cleaned.',
  premixRatio:
    'Parts of fuel to one part of two-stroke oil, as you mix it: write 32 for 32:1. Check the can or your mixing notes.',
  ventLinesFitted:
    'Hoses pushed onto the small vent nipples (short tubes) on the carburettor that let air in and out of the float bowl.',
  ventLinesRoutedUp:
    'Whether those vent hoses run upward from the carburettor, with their ends clear of dirt and of the exhaust.',
};

const dateFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

/** A calendar date `YYYY-MM-DD` written for people ("1 Mar 2026"); the text itself if it is not one. */
export function formatCalendarDate(iso: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(iso);
  if (!match) return iso;
  const date = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  return Number.isNaN(date.getTime()) ? iso : dateFormat.format(date);
}

const yesNo = (value: boolean) => (value ? 'Yes' : 'No');

/** One field of a snapshot, written for people; null when the field was not recorded. */
export function formatSetupValue(field: SetupField, setup: SetupSnapshot): string | null {
  const value = setup[field];
  if (value === undefined || value === null) return null;
  switch (field) {
    case 'carburettorKind':
      return value === 'pump-around' ? 'Pump-around' : 'Float-valve';
    case 'needleClipGroove':
      return `Groove ${String(value)} from the top`;
    case 'airScrewTurnsOut':
      return `${String(value)} turns out`;
    case 'idleScrew':
      return IDLE_SCREW_STATE_LABELS[setup.idleScrew!];
    case 'idleScrewTurns':
      return `${String(value)} ${value === 1 ? 'turn' : 'turns'} in`;
    case 'foamFittedDate':
    case 'lastRebuildDate':
      return formatCalendarDate(String(value));
    case 'premixRatio':
      return `${String(value)}:1`;
    case 'ventLinesFitted':
    case 'ventLinesRoutedUp':
      return yesNo(Boolean(value));
    default:
      return String(value);
  }
}
