import { boolean, date, doublePrecision, index, integer, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { IDLE_SCREW_STATES } from '@fuelwright/shared';
import { karts } from './karts.js';
import { users } from './users.js';

export const idleScrewEnum = pgEnum('idle_screw', IDLE_SCREW_STATES);

/**
 * A dated setup snapshot of one kart. Snapshots are never edited: a change is a new snapshot, so
 * the table of past setups shows what changed between them. Every setting may be unknown (null).
 */
export const setups = pgTable(
  'setups',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kartId: uuid('kart_id')
      .notNull()
      .references(() => karts.id, { onDelete: 'cascade' }),
    takenOn: date('taken_on', { mode: 'string' }).notNull(),
    mainJet: doublePrecision('main_jet'),
    pilotJet: doublePrecision('pilot_jet'),
    needleClipGroove: integer('needle_clip_groove'),
    airScrewTurnsOut: doublePrecision('air_screw_turns_out'),
    idleScrew: idleScrewEnum('idle_screw'),
    idleScrewTurns: doublePrecision('idle_screw_turns'),
    foamFittedDate: date('foam_fitted_date', { mode: 'string' }),
    lastRebuildDate: date('last_rebuild_date', { mode: 'string' }),
    premixRatio: doublePrecision('premix_ratio'),
    ventLinesFitted: boolean('vent_lines_fitted'),
    ventLinesRoutedUp: boolean('vent_lines_routed_up'),
    note: text('note').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('setups_kart_id_taken_on_idx').on(t.kartId, t.takenOn)],
);

export type SetupRow = typeof setups.$inferSelect;
