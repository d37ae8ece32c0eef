import { doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { CASE_EVENT_TYPES, CASE_STATES } from '@fuelwright/shared';
import { karts } from './karts.js';
import { users } from './users.js';

export const caseStateEnum = pgEnum('case_state', CASE_STATES);
export const caseEventTypeEnum = pgEnum('case_event_type', CASE_EVENT_TYPES);

/**
 * The current state of each case: a projection of its events, rewritten in the same transaction
 * as every appended event, so lists and filters need no replay. `revision` is the number of
 * events; appending checks it (optimistic concurrency).
 */
export const cases = pgTable(
  'cases',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    kartId: uuid('kart_id')
      .notNull()
      .references(() => karts.id, { onDelete: 'cascade' }),
    state: caseStateEnum('state').notNull().default('open'),
    rulesetVersion: text('ruleset_version').notNull(),
    symptomIds: text('symptom_ids').array().notNull(),
    topCauseId: text('top_cause_id'),
    topCauseProbability: doublePrecision('top_cause_probability'),
    /** The whole replayed case (CaseState of the service's projection), for reading without replay. */
    snapshot: jsonb('snapshot').notNull(),
    revision: integer('revision').notNull(),
    openedAt: timestamp('opened_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('cases_owner_id_updated_at_idx').on(t.ownerId, t.updatedAt), index('cases_kart_id_idx').on(t.kartId)],
);

/** Every step of every case, appended and never changed. */
export const caseEvents = pgTable(
  'case_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    caseId: uuid('case_id')
      .notNull()
      .references(() => cases.id, { onDelete: 'cascade' }),
    seq: integer('seq').notNull(),
    type: caseEventTypeEnum('type').notNull(),
    payload: jsonb('payload').notNull(),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique('case_events_case_id_seq_unique').on(t.caseId, t.seq)],
);

export type CaseRow = typeof cases.$inferSelect;
export type CaseEventRow = typeof caseEvents.$inferSelect;
