import {
  CARBURETTOR_KINDS,
  DISPLACEMENT_RANGE_CC,
  DRIVES,
  KART_NAME_MAX_LENGTH,
  KART_NOTES_MAX_LENGTH,
  type CarburettorKind,
  type Drive,
  type KartDto,
  type KartInput,
} from '@fuelwright/shared';

/** What the user typed, as text, so nothing is lost when a submit is rejected. */
export interface KartFormValues {
  name: string;
  displacementCc: string;
  drive: Drive | '';
  carburettorKind: CarburettorKind | '';
  notes: string;
}

export const KART_FORM_FIELDS = ['name', 'displacementCc', 'drive', 'carburettorKind', 'notes'] as const;

export const EMPTY_KART_FORM: KartFormValues = { name: '', displacementCc: '', drive: '', carburettorKind: '', notes: '' };

export function kartFormFrom(kart: KartDto): KartFormValues {
  return {
    name: kart.name,
    displacementCc: String(kart.displacementCc),
    drive: kart.drive,
    carburettorKind: kart.carburettorKind,
    notes: kart.notes,
  };
}

export interface ParsedKartForm {
  input: KartInput | null;
  errors: Record<string, string[]>;
}

/** The same rules as the server (shared/src/karts.ts), with messages in plain words. */
export function validateKartForm(values: KartFormValues): ParsedKartForm {
  const errors: Record<string, string[]> = {};
  const name = values.name.trim();
  if (name === '') errors.name = ['Give the kart a name: a number or nickname you know it by.'];
  else if (name.length > KART_NAME_MAX_LENGTH) errors.name = [`Keep the name to ${KART_NAME_MAX_LENGTH} characters or fewer.`];

  const { min, max } = DISPLACEMENT_RANGE_CC;
  const ccText = values.displacementCc.trim();
  const cc = Number(ccText);
  if (ccText === '') errors.displacementCc = ['Enter the engine size in cc, as stamped on the engine (for example 125).'];
  else if (!/^\d+$/.test(ccText)) errors.displacementCc = ['Write the engine size as a whole number of cc, for example 125.'];
  else if (cc < min || cc > max) errors.displacementCc = [`Kart engines run from ${min} to ${max} cc.`];

  if (!DRIVES.includes(values.drive as Drive)) errors.drive = ['Pick gearbox or direct drive.'];
  if (!CARBURETTOR_KINDS.includes(values.carburettorKind as CarburettorKind)) {
    errors.carburettorKind = ['Pick the kind of carburettor: pump-around or float-valve.'];
  }
  if (values.notes.length > KART_NOTES_MAX_LENGTH) errors.notes = [`Keep the notes to ${KART_NOTES_MAX_LENGTH} characters or fewer.`];

  if (Object.keys(errors).length > 0) return { input: null, errors };
  return {
    input: {
      name,
      displacementCc: cc,
      drive: values.drive as Drive,
      carburettorKind: values.carburettorKind as CarburettorKind,
      notes: values.notes.trim(),
    },
    errors,
  };
}
