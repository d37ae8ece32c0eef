import { date, doublePrecision, index, integer, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { karts } from './karts.js';
import { setups } from './setups.js';
import { users } from './users.js';

export const ranEnum = pgEnum('ran', ['rich', 'right', 'lean']);
export const plugColourEnum = pgEnum('plug_colour', ['white', 'light-tan', 'tan', 'dark-brown', 'black-wet']);

/**
 * One session of the jetting log: the day's air as entered (and the densities computed from it at
 * the time), the jets it ran, how it ran. Sessions that ran "right" are the baselines of the jet
 * suggestion. Entries are not edited in place; a wrong one is deleted and entered again.
 */
export const jettingSessions = pgTable(
  'jetting_sessions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kartId: uuid('kart_id')
      .notNull()
      .references(() => karts.id, { onDelete: 'cascade' }),
    sessionOn: date('session_on', { mode: 'string' }).notNull(),
    track: text('track').notNull().default(''),
    temperatureC: doublePrecision('temperature_c').notNull(),
    stationPressureHpa: doublePrecision('station_pressure_hpa').notNull(),
    relativeHumidityPct: doublePrecision('relative_humidity_pct').notNull(),
    densityKgM3: doublePrecision('density_kg_m3').notNull(),
    dryAirDensityKgM3: doublePrecision('dry_air_density_kg_m3').notNull(),
    /** The setup snapshot it ran with, when one was recorded. */
    setupId: uuid('setup_id').references(() => setups.id, { onDelete: 'set null' }),
    mainJet: doublePrecision('main_jet').notNull(),
    pilotJet: doublePrecision('pilot_jet'),
    needleClipGroove: integer('needle_clip_groove'),
    airScrewTurnsOut: doublePrecision('air_screw_turns_out'),
    plugColour: plugColourEnum('plug_colour'),
    ran: ranEnum('ran').notNull(),
    lapTimeMs: integer('lap_time_ms'),
    note: text('note').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('jetting_sessions_kart_id_session_on_idx').on(t.kartId, t.sessionOn)],
);

export type JettingSessionRow = typeof jettingSessions.$inferSelect;
