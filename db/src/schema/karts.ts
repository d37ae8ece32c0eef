import { index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { CARBURETTOR_KINDS, DRIVES } from '@fuelwright/shared';
import { users } from './users.js';

export const driveEnum = pgEnum('drive', DRIVES);
export const carburettorKindEnum = pgEnum('carburettor_kind', CARBURETTOR_KINDS);

export const karts = pgTable(
  'karts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    /** Always a two-stroke here; displacement in cubic centimetres. */
    displacementCc: integer('displacement_cc').notNull(),
    drive: driveEnum('drive').notNull(),
    carburettorKind: carburettorKindEnum('carburettor_kind').notNull(),
    notes: text('notes').notNull().default(''),
    /** The racer's jet kit: how jet numbers scale and which sizes are held (null = not set). */
    jetKit: jsonb('jet_kit'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('karts_owner_id_idx').on(t.ownerId)],
);

export type Kart = typeof karts.$inferSelect;
export type NewKart = typeof karts.$inferInsert;
