/**
 * Drizzle schema: the single source of truth for the database. Migrations in drizzle/ are generated from
 * this file with `npm run db:generate` (drizzle-kit) and committed; never edit an applied migration.
 *
 * Table and column names are binding (other modules and the lab routes build on them).
 */
import { sql } from 'drizzle-orm';
import {
  check,
  boolean,
  customType,
  index,
  integer,
  json,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  real,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';

/** PostgreSQL bytea mapped to a Node Buffer. */
export const bytea = customType<{ data: Buffer; driverData: Buffer }>({
  dataType() {
    return 'bytea';
  },
  toDriver(value: Buffer): Buffer {
    return value;
  },
  fromDriver(value: Buffer): Buffer {
    return Buffer.isBuffer(value) ? value : Buffer.from(value as unknown as Uint8Array);
  },
});

const createdAt = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow();

export const roleEnum = pgEnum('workspace_role', ['owner', 'editor', 'viewer']);

/** Accounts. `email` is stored lower-case (enforced by a check and by the service). */
export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    passwordHash: text('password_hash').notNull(),
    isAdmin: boolean('is_admin').notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email), check('users_email_lower_case', sql`${t.email} = lower(${t.email})`)],
);

export const workspaces = pgTable('workspaces', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  description: text('description').notNull().default(''),
  createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export const memberships = pgTable(
  'memberships',
  {
    workspaceId: uuid('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum('role').notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.workspaceId, t.userId] }), index('memberships_user_idx').on(t.userId)],
);

/** Pending and accepted invitations; the token itself is only in the email, we keep its SHA-256. */
export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    workspaceId: uuid('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: roleEnum('role').notNull(),
    tokenHash: text('token_hash').notNull(),
    invitedBy: uuid('invited_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedBy: uuid('accepted_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [uniqueIndex('invitations_token_hash_unique').on(t.tokenHash), index('invitations_workspace_idx').on(t.workspaceId)],
);

/** connect-pg-simple's table (its table.sql), owned by our migrations. */
export const session = pgTable(
  'session',
  {
    sid: varchar('sid').primaryKey(),
    sess: json('sess').notNull(),
    expire: timestamp('expire', { precision: 6, withTimezone: false }).notNull(),
  },
  (t) => [index('IDX_session_expire').on(t.expire)],
);

export const diagrams = pgTable(
  'diagrams',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    workspaceId: uuid('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    headRevision: integer('head_revision').notNull().default(0),
    deletedAt: timestamp('deleted_at', { withTimezone: true }),
    deletedBy: uuid('deleted_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [index('diagrams_workspace_idx').on(t.workspaceId)],
);

export const diagramRevisions = pgTable(
  'diagram_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    diagramId: uuid('diagram_id')
      .notNull()
      .references(() => diagrams.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    parentNumber: integer('parent_number'),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    message: text('message').notNull().default(''),
    operation: jsonb('operation'),
    mesh: bytea('mesh').notNull(),
    curves: jsonb('curves').notNull(),
    basepoints: jsonb('basepoints').notNull(),
    vertexLabels: bytea('vertex_labels'),
    stats: jsonb('stats'),
  },
  (t) => [uniqueIndex('diagram_revisions_diagram_number_unique').on(t.diagramId, t.number)],
);

export const analyses = pgTable('analyses', {
  revisionId: uuid('revision_id')
    .primaryKey()
    .references(() => diagramRevisions.id, { onDelete: 'cascade' }),
  /** pending | running | done | failed */
  status: text('status').notNull().default('pending'),
  progress: real('progress').notNull().default(0),
  result: jsonb('result'),
  error: jsonb('error'),
  startedAt: timestamp('started_at', { withTimezone: true }),
  finishedAt: timestamp('finished_at', { withTimezone: true }),
}, (t) => [check('analyses_status_valid', sql`${t.status} in ('pending', 'running', 'done', 'failed')`)]);

export const domains = pgTable(
  'domains',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    diagramId: uuid('diagram_id')
      .notNull()
      .references(() => diagrams.id, { onDelete: 'cascade' }),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => diagramRevisions.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    coefficients: jsonb('coefficients').notNull(),
    fromPoints: jsonb('from_points'),
    toPoints: jsonb('to_points'),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('domains_diagram_idx').on(t.diagramId)],
);

export const shareLinks = pgTable(
  'share_links',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    diagramId: uuid('diagram_id')
      .notNull()
      .references(() => diagrams.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('share_links_token_hash_unique').on(t.tokenHash)],
);


// --- lab (lab-server helper): per-revision analysis summary for library rows --------------------------
/**
 * The few analysis facts the library lists, written with the analysis result, so listing diagrams never
 * reads the (large) result JSON. One row per revision whose analysis is done.
 */
export const analysisSummaries = pgTable('analysis_summaries', {
  revisionId: uuid('revision_id')
    .primaryKey()
    .references(() => diagramRevisions.id, { onDelete: 'cascade' }),
  intersectionCount: integer('intersection_count').notNull(),
  generatorCount: text('generator_count'),
  nice: boolean('nice'),
  weaklyAdmissible: boolean('weakly_admissible'),
  h1: text('h1'),
});
