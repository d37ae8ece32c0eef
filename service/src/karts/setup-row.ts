import { SETUP_FIELDS, type SetupDto, type SetupField } from '@fuelwright/shared';
import type { SetupRow } from '@fuelwright/db';

const VALUE_FIELDS = SETUP_FIELDS.filter((f) => f !== 'carburettorKind') as Exclude<SetupField, 'carburettorKind'>[];

/** Snapshots newest first, each with the fields that differ from the one before it. */
export function toSetupDtos(rowsNewestFirst: SetupRow[]): SetupDto[] {
  return rowsNewestFirst.map((row, i) => {
    const older = rowsNewestFirst[i + 1];
    const values = Object.fromEntries(VALUE_FIELDS.filter((f) => row[f] !== null).map((f) => [f, row[f]]));
    return {
      ...values,
      id: row.id,
      kartId: row.kartId,
      takenOn: row.takenOn,
      note: row.note,
      createdAt: row.createdAt.toISOString(),
      changedFields: older ? VALUE_FIELDS.filter((f) => row[f] !== older[f]) : [],
    } as SetupDto;
  });
}
