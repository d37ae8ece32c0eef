import { boolean, date, doublePrecision, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { cases } from './cases.js';
import { karts } from './karts.js';
import { users } from './users.js';

/**
 * Published ruleset versions: the catalog and rules as JSON (a RulesetSource), immutable once
 * written. Exactly one is active: new cases are ranked with it; rolling back activates an older one.
 */
export const rulesets = pgTable('rulesets', {
  version: text('version').primaryKey(),
  source: jsonb('source').notNull(),
  parentVersion: text('parent_version'),
  notes: text('notes').notNull().default(''),
  active: boolean('active').notNull().default(false),
  publishedBy: uuid('published_by').references(() => users.id, { onDelete: 'set null' }),
  publishedAt: timestamp('published_at', { withTimezone: true }).notNull().defaultNow(),
});

export const proposalStatusEnum = pgEnum('proposal_status', ['running', 'ready', 'failed', 'published', 'discarded']);

/** A re-fit of priors and likelihood ratios from outcomes, with its back-test; a shop or admin starts one, an admin publishes it. */
export const proposals = pgTable('proposals', {
  id: uuid('id').primaryKey().defaultRandom(),
  baseVersion: text('base_version').notNull(),
  proposedVersion: text('proposed_version').notNull(),
  strength: doublePrecision('strength').notNull(),
  seed: integer('seed').notNull(),
  holdOutFraction: doublePrecision('hold_out_fraction').notNull(),
  status: proposalStatusEnum('status').notNull().default('running'),
  progress: doublePrecision('progress').notNull().default(0),
  /** Diff (old, proposed, evidence), back-test figures and the proposed ruleset source. */
  result: jsonb('result'),
  error: text('error'),
  createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  finishedAt: timestamp('finished_at', { withTimezone: true }),
});

export const workOrderStatusEnum = pgEnum('work_order_status', ['open', 'done']);

/** A shop's job on a customer's kart: linked to a shared case, or a walk-in with its symptoms entered on the spot. */
export const workOrders = pgTable(
  'work_orders',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: uuid('shop_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    caseId: uuid('case_id').references(() => cases.id, { onDelete: 'set null' }),
    customerName: text('customer_name').notNull(),
    kartDescription: text('kart_description').notNull().default(''),
    symptoms: jsonb('symptoms').notNull(),
    setup: jsonb('setup').notNull().default({}),
    status: workOrderStatusEnum('status').notNull().default('open'),
    notes: text('notes').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('work_orders_shop_id_idx').on(t.shopId, t.createdAt)],
);

/**
 * What was really wrong and what fixed it. Never edited: a correction is a new row that names the
 * one it supersedes. The opening ranking (top causes with probabilities, fired rules) is kept with
 * the outcome so accuracy is measured against what the racer was shown.
 */
export const outcomes = pgTable(
  'outcomes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    caseId: uuid('case_id').references(() => cases.id, { onDelete: 'set null' }),
    workOrderId: uuid('work_order_id').references(() => workOrders.id, { onDelete: 'set null' }),
    kartId: uuid('kart_id').references(() => karts.id, { onDelete: 'set null' }),
    loggedBy: uuid('logged_by').references(() => users.id, { onDelete: 'set null' }),
    rulesetVersion: text('ruleset_version').notNull(),
    symptoms: jsonb('symptoms').notNull(),
    setup: jsonb('setup').notNull().default({}),
    openingRank: jsonb('opening_rank').notNull(),
    confirmedCauses: text('confirmed_causes').array().notNull(),
    otherNote: text('other_note').notNull().default(''),
    fix: text('fix').notNull(),
    parts: text('parts').notNull().default(''),
    labourMinutes: integer('labour_minutes'),
    stillFixed: boolean('still_fixed'),
    /** The outcome this one corrects (the corrected one stays as it was, and no longer counts). */
    supersedesId: uuid('supersedes_id'),
    /** Invented records from the demo generator. */
    demo: boolean('demo').notNull().default(false),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('outcomes_version_at_idx').on(t.rulesetVersion, t.at), index('outcomes_case_id_idx').on(t.caseId), index('outcomes_supersedes_id_idx').on(t.supersedesId)],
);

export const insightRollupKindEnum = pgEnum('insight_rollup_kind', ['day', 'month']);

/**
 * The insight counters of one ruleset version's current outcomes over one UTC day or one calendar
 * month (an InsightsAccumulator state, see rules/src/learning/metrics.ts). Insights for a period
 * merge the months it covers whole and the days at its ends, instead of re-reading every outcome.
 * Rebuilt from `outcomes` for the days in `insight_rollup_dirty`.
 */
export const insightRollups = pgTable(
  'insight_rollups',
  {
    rulesetVersion: text('ruleset_version').notNull(),
    kind: insightRollupKindEnum('kind').notNull(),
    /** The day, or the first day of the month. */
    start: date('start', { mode: 'string' }).notNull(),
    /** Current outcomes counted. */
    outcomes: integer('outcomes').notNull(),
    state: jsonb('state').notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.rulesetVersion, t.kind, t.start] })],
);

/**
 * Days whose roll-ups are out of date. Triggers on `outcomes` (migration 0007) add a row for every
 * (version, UTC day) an insert, update or delete touches, including the day of an outcome a
 * correction supersedes; the insights service rebuilds those days and their months, then removes the rows.
 */
export const insightRollupDirty = pgTable(
  'insight_rollup_dirty',
  {
    rulesetVersion: text('ruleset_version').notNull(),
    day: date('day', { mode: 'string' }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.rulesetVersion, t.day] })],
);

export type RulesetRow = typeof rulesets.$inferSelect;
export type ProposalRow = typeof proposals.$inferSelect;
export type OutcomeRow = typeof outcomes.$inferSelect;
export type WorkOrderRow = typeof workOrders.$inferSelect;
