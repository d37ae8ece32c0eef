/**
 * The setup form's values and its client-side checks: the same ranges as the server
 * (shared/src/setup.ts SETUP_RANGES), dates not in the future, messages in trade words.
 */
import {
  IDLE_SCREW_STATES,
  SETUP_RANGES,
  type IdleScrewState,
  type SetupDto,
  type SetupInput,
} from '@fuelwright/shared';

export type YesNo = '' | 'yes' | 'no';

/** Everything as typed (text), so nothing is lost when a submit is rejected. '' = not recorded. */
export interface SetupFormValues {
  takenOn: string;
  mainJet: string;
  pilotJet: string;
  needleClipGroove: string;
  airScrewTurnsOut: string;
  idleScrew: IdleScrewState | '';
  idleScrewTurns: string;
  foamFittedDate: string;
  lastRebuildDate: string;
  premixRatio: string;
  ventLinesFitted: YesNo;
  ventLinesRoutedUp: YesNo;
  note: string;
}

export type SetupFormField = keyof SetupFormValues;

/** Form fields in display order; the API names its 400 `fields` the same way. */
export const SETUP_FORM_FIELDS = [
  'takenOn',
  'mainJet',
  'pilotJet',
  'needleClipGroove',
  'airScrewTurnsOut',
  'idleScrew',
  'idleScrewTurns',
  'foamFittedDate',
  'lastRebuildDate',
  'premixRatio',
  'ventLinesFitted',
  'ventLinesRoutedUp',
  'note',
] as const satisfies readonly SetupFormField[];

export const SETUP_NOTE_MAX_LENGTH = 2000;

/** Today's calendar date where the user is, `YYYY-MM-DD`. */
export function todayIso(now: Date = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}

const text = (value: number | undefined) => (value === undefined || value === null ? '' : String(value));
const yesNo = (value: boolean | undefined): YesNo => (value === undefined || value === null ? '' : value ? 'yes' : 'no');

/** A new snapshot starts from the latest one (if any), dated today, with an empty note. */
export function setupFormFrom(latest: SetupDto | undefined, today: string): SetupFormValues {
  return {
    takenOn: today,
    mainJet: text(latest?.mainJet),
    pilotJet: text(latest?.pilotJet),
    needleClipGroove: text(latest?.needleClipGroove),
    airScrewTurnsOut: text(latest?.airScrewTurnsOut),
    idleScrew: latest?.idleScrew ?? '',
    idleScrewTurns: text(latest?.idleScrewTurns),
    foamFittedDate: latest?.foamFittedDate ?? '',
    lastRebuildDate: latest?.lastRebuildDate ?? '',
    premixRatio: text(latest?.premixRatio),
    ventLinesFitted: yesNo(latest?.ventLinesFitted),
    ventLinesRoutedUp: yesNo(latest?.ventLinesRoutedUp),
    note: '',
  };
}

/** A number typed with a point or a comma; null when it is not one. */
export function parseDecimal(raw: string): number | null {
  const t = raw.trim().replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  return Number(t);
}

/** "32", "32:1" or "32 : 1" all mean 32 parts of fuel to one of oil. */
export function parsePremix(raw: string): number | null {
  const match = /^\s*([^:]+?)\s*(?::\s*1\s*)?$/.exec(raw);
  return match ? parseDecimal(match[1]) : null;
}

type NumericField = keyof typeof SETUP_RANGES;

/** How each number is described in messages: what to write, and an example. */
const NUMBER_WORDS: Record<NumericField, { what: string; example: string; whole?: boolean }> = {
  mainJet: { what: 'the main jet size (the number stamped on the jet)', example: '185' },
  pilotJet: { what: 'the pilot jet size (the number stamped on the jet)', example: '37.5' },
  needleClipGroove: { what: 'the groove the clip sits in, counted from the top of the needle', example: '3', whole: true },
  airScrewTurnsOut: { what: 'the air screw turns out from lightly seated', example: '1.5' },
  idleScrewTurns: { what: 'the idle screw turns in from touching the slide', example: '1' },
  premixRatio: { what: 'the premix ratio, parts of fuel to one part of oil', example: '32' },
};

const RANGE_MESSAGES: Record<NumericField, (min: number, max: number) => string> = {
  mainJet: (min, max) => `Main jets run from ${min} to ${max}: check the number stamped on the jet.`,
  pilotJet: (min, max) => `Pilot jets run from ${min} to ${max}: check the number stamped on the jet.`,
  needleClipGroove: (min, max) => `Count the grooves from the top of the needle: ${min} (top groove) to ${max}.`,
  airScrewTurnsOut: (min, max) => `The air screw is from ${min} to ${max} turns out from lightly seated.`,
  idleScrewTurns: (min, max) => `The idle screw is from ${min} to ${max} turns in from touching the slide.`,
  premixRatio: (min, max) => `Premix ratios run from ${min}:1 to ${max}:1 (write 32 for 32:1).`,
};

const DATE_WORDS = {
  takenOn: 'the day the kart ran with this setup',
  foamFittedDate: 'the day new foam went into the bowl',
  lastRebuildDate: 'the day of the last rebuild',
} as const;

/** The server refuses dates before this one. */
const EARLIEST_DATE = '1970-01-01';

function isCalendarDate(value: string): boolean {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (!match) return false;
  const date = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  return date.getUTCFullYear() === Number(match[1]) && date.getUTCMonth() === Number(match[2]) - 1 && date.getUTCDate() === Number(match[3]);
}

export interface ParsedSetupForm {
  /** The request body, or null when any field is wrong. */
  input: SetupInput | null;
  /** Messages by field name. */
  errors: Partial<Record<SetupFormField, string[]>>;
}

/** Checks every field and builds the request body; empty fields are left out (not recorded). */
export function validateSetupForm(values: SetupFormValues, today: string): ParsedSetupForm {
  const errors: Partial<Record<SetupFormField, string[]>> = {};
  const input: Partial<SetupInput> = {};

  const date = (field: keyof typeof DATE_WORDS, required: boolean) => {
    const raw = values[field].trim();
    if (raw === '') {
      if (required) errors[field] = [`Enter ${DATE_WORDS[field]}.`];
      return;
    }
    if (!isCalendarDate(raw)) errors[field] = [`Write ${DATE_WORDS[field]} as a date (year-month-day).`];
    else if (raw > today) errors[field] = [`${DATE_WORDS[field][0].toUpperCase()}${DATE_WORDS[field].slice(1)} cannot be in the future.`];
    else if (raw < EARLIEST_DATE) errors[field] = [`Check the year of ${DATE_WORDS[field]}.`];
    else input[field] = raw;
  };

  const number = (field: NumericField) => {
    const raw = values[field];
    if (raw.trim() === '') return;
    const words = NUMBER_WORDS[field];
    const n = field === 'premixRatio' ? parsePremix(raw) : parseDecimal(raw);
    const { min, max } = SETUP_RANGES[field];
    if (n === null) errors[field] = [`Write ${words.what} as a number, for example ${words.example}.`];
    else if (words.whole && !Number.isInteger(n)) errors[field] = [`Use a whole groove number, counted from the top of the needle: ${min} (top groove) to ${max}.`];
    else if (n < min || n > max) errors[field] = [RANGE_MESSAGES[field](min, max)];
    else input[field] = n;
  };

  date('takenOn', true);
  number('mainJet');
  number('pilotJet');
  number('needleClipGroove');
  number('airScrewTurnsOut');
  if (values.idleScrew !== '') {
    if (IDLE_SCREW_STATES.includes(values.idleScrew)) input.idleScrew = values.idleScrew;
    else errors.idleScrew = ['Pick backed off or set.'];
  }
  number('idleScrewTurns');
  date('foamFittedDate', false);
  date('lastRebuildDate', false);
  number('premixRatio');
  if (values.ventLinesFitted !== '') input.ventLinesFitted = values.ventLinesFitted === 'yes';
  // Routed up means nothing without vent lines: it is recorded only when they are fitted.
  if (values.ventLinesRoutedUp !== '' && values.ventLinesFitted !== 'no') input.ventLinesRoutedUp = values.ventLinesRoutedUp === 'yes';
  const note = values.note.trim();
  if (note.length > SETUP_NOTE_MAX_LENGTH) errors.note = [`Keep the note to ${SETUP_NOTE_MAX_LENGTH} characters or fewer.`];
  else if (note !== '') input.note = note;

  if (Object.keys(errors).length > 0) return { input: null, errors };
  return { input: input as SetupInput, errors };
}
