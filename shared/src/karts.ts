import type { SetupField, SetupSnapshot } from './setup.js';

/** Kart contracts (GET/POST /api/karts, GET/PATCH/DELETE /api/karts/:id). */
export const DRIVES = ['gearbox', 'direct-drive'] as const;
export type Drive = (typeof DRIVES)[number];

export const CARBURETTOR_KINDS = ['pump-around', 'float-valve'] as const;
export type CarburettorKind = (typeof CARBURETTOR_KINDS)[number];

/** Two-stroke kart engines run from about 50 cc (cadet) to 250 cc (twin shifter classes). */
export const DISPLACEMENT_RANGE_CC = { min: 50, max: 250 } as const;
export const KART_NAME_MAX_LENGTH = 60;
export const KART_NOTES_MAX_LENGTH = 2000;

export interface KartDto {
  id: string;
  ownerId: string;
  ownerName: string;
  name: string;
  displacementCc: number;
  drive: Drive;
  carburettorKind: CarburettorKind;
  notes: string;
  createdAt: string;
  updatedAt: string;
}

export interface KartInput {
  name: string;
  displacementCc: number;
  drive: Drive;
  carburettorKind: CarburettorKind;
  notes?: string;
}

export interface KartListResponse {
  karts: KartDto[];
}

export const DRIVE_LABELS: Record<Drive, string> = {
  gearbox: 'Gearbox (shifter)',
  'direct-drive': 'Direct drive',
};

export const CARBURETTOR_KIND_LABELS: Record<CarburettorKind, string> = {
  'pump-around': 'Pump-around slide carburettor',
  'float-valve': 'Float-valve slide carburettor',
};


/** The settings of a setup snapshot as stored per kart (the carburettor kind lives on the kart). */
export type SetupValues = Omit<SetupSnapshot, 'carburettorKind'>;

/** POST /api/karts/:id/setups. `takenOn` is the day the kart ran with it (not in the future). */
export interface SetupInput extends SetupValues {
  takenOn: string;
  note?: string;
}

/** One snapshot; `changedFields` lists what differs from the snapshot before it (older). */
export interface SetupDto extends SetupValues {
  id: string;
  kartId: string;
  takenOn: string;
  note: string;
  createdAt: string;
  changedFields: SetupField[];
}

/** GET /api/karts/:id/setups: newest first. */
export interface SetupListResponse {
  setups: SetupDto[];
}
