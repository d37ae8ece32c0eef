import { boolean, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { cases } from './cases.js';
import { karts } from './karts.js';
import { roleEnum, users } from './users.js';

export const shareScopeEnum = pgEnum('share_scope', ['kart', 'case']);

/**
 * A racer's share of a kart (and so all its cases) or of one case with a coach or a shop. Until the
 * invitee has an account, `granteeId` is null and an invitation is pending. Revoking sets
 * `revokedAt`; access ends at once because every check reads this table.
 */
export const shares = pgTable(
  'shares',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    scope: shareScopeEnum('scope').notNull(),
    kartId: uuid('kart_id')
      .notNull()
      .references(() => karts.id, { onDelete: 'cascade' }),
    caseId: uuid('case_id').references(() => cases.id, { onDelete: 'cascade' }),
    inviteeEmail: text('invitee_email').notNull(),
    /** What the invitee is to the owner (coach or shop): a label on the share and beside their comments; it gives no account role. */
    inviteeRole: roleEnum('invitee_role').notNull(),
    granteeId: uuid('grantee_id').references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [index('shares_grantee_id_idx').on(t.granteeId), index('shares_kart_id_idx').on(t.kartId), index('shares_case_id_idx').on(t.caseId)],
);

export const tokenKindEnum = pgEnum('token_kind', ['invitation', 'email-verification', 'password-reset']);

/** Single-use, expiring tokens sent by e-mail; only a keyed hash is stored. */
export const authTokens = pgTable(
  'auth_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kind: tokenKindEnum('kind').notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    userId: uuid('user_id').references(() => users.id, { onDelete: 'cascade' }),
    shareId: uuid('share_id').references(() => shares.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('auth_tokens_email_idx').on(t.email)],
);

/** The comment thread of a case. Text only; never rendered as HTML. */
export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    caseId: uuid('case_id')
      .notNull()
      .references(() => cases.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('comments_case_id_idx').on(t.caseId, t.createdAt)],
);

/** A coach's or shop's request for a photo, answered by an upload. */
export const photoRequests = pgTable(
  'photo_requests',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    caseId: uuid('case_id')
      .notNull()
      .references(() => cases.id, { onDelete: 'cascade' }),
    requestedBy: uuid('requested_by').references(() => users.id, { onDelete: 'set null' }),
    what: text('what').notNull(),
    checkId: text('check_id'),
    fulfilledByPhotoId: uuid('fulfilled_by_photo_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('photo_requests_case_id_idx').on(t.caseId)],
);

/** Photos of a case or of one of its check results; bytes live in object storage. */
export const photos = pgTable(
  'photos',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    caseId: uuid('case_id')
      .notNull()
      .references(() => cases.id, { onDelete: 'cascade' }),
    checkId: text('check_id'),
    uploaderId: uuid('uploader_id').references(() => users.id, { onDelete: 'set null' }),
    objectKey: text('object_key').notNull(),
    thumbKey: text('thumb_key').notNull(),
    contentType: text('content_type').notNull(),
    bytes: integer('bytes').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    caption: text('caption').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('photos_case_id_idx').on(t.caseId)],
);

export const mailStatusEnum = pgEnum('mail_status', ['pending', 'sent', 'failed']);

/**
 * Every e-mail the app sends goes through this outbox: written in the same transaction as the
 * event that causes it, then sent and retried with backoff, so a failed send loses nothing.
 */
export const outbox = pgTable(
  'outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kind: text('kind').notNull(),
    toEmail: text('to_email').notNull(),
    toUserId: uuid('to_user_id').references(() => users.id, { onDelete: 'set null' }),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html').notNull(),
    status: mailStatusEnum('status').notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    lastError: text('last_error'),
    messageId: text('message_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    unsubscribable: boolean('unsubscribable').notNull().default(false),
    /** A sender's lease: set when it claims the row, cleared when it records the outcome; a crashed sender's rows come back once it passes. */
    lockedUntil: timestamp('locked_until', { withTimezone: true }),
    /**
     * Set on a message held back to gather several steps (a case's progress for one recipient):
     * while it waits (`next_attempt_at` still ahead, never tried), a later step with the same key
     * and recipient rewrites it, appending to `coalesced_steps`, instead of queuing another.
     */
    coalesceKey: text('coalesce_key'),
    coalescedSteps: jsonb('coalesced_steps').$type<string[]>(),
  },
  (t) => [index('outbox_status_next_attempt_idx').on(t.status, t.nextAttemptAt)],
);

export type ShareRow = typeof shares.$inferSelect;
export type CommentRow = typeof comments.$inferSelect;
export type PhotoRow = typeof photos.$inferSelect;
export type OutboxRow = typeof outbox.$inferSelect;
