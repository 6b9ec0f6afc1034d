// Tables of Axlewright. Later features (designs, revisions, sign-offs, cut plans, files, build-log
// entries) hang off `projects` and `users` by foreign key and log into `audit_log`, so these tables
// do not need reshaping when they arrive.
import { relations } from "drizzle-orm";
import {
  boolean,
  char,
  double,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  timestamp,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";

export const USER_ROLES = ["admin", "fabricator", "client", "installer"] as const;
export type UserRole = (typeof USER_ROLES)[number];

/** A person's part in one project (an admin needs no membership to see everything). */
export const MEMBER_ROLES = ["fabricator", "client", "installer"] as const;
export type MemberRole = (typeof MEMBER_ROLES)[number];

export const PROJECT_STATUSES = [
  "design",
  "review",
  "approved",
  "cutting",
  "installing",
  "installed",
  "archived",
] as const;
export type ProjectStatus = (typeof PROJECT_STATUSES)[number];

export const ORGANISATION_KINDS = ["shop", "client", "installer"] as const;

export const organisations = mysqlTable("organisations", {
  id: int("id").autoincrement().primaryKey(),
  name: varchar("name", { length: 160 }).notNull().unique(),
  kind: mysqlEnum("kind", ORGANISATION_KINDS).notNull(),
  createdAt: timestamp("created_at").notNull().defaultNow(),
});

export const users = mysqlTable("users", {
  id: int("id").autoincrement().primaryKey(),
  email: varchar("email", { length: 254 }).notNull().unique(),
  name: varchar("name", { length: 120 }).notNull(),
  passwordHash: varchar("password_hash", { length: 255 }).notNull(),
  role: mysqlEnum("role", USER_ROLES).notNull(),
  active: boolean("active").notNull().default(true),
  organisationId: int("organisation_id").references(() => organisations.id),
  /** Sessions issued before this moment (whole seconds, as JWT "iat") are ended: set when the password changes. */
  sessionsFrom: timestamp("sessions_from"),
  createdAt: timestamp("created_at").notNull().defaultNow(),
  updatedAt: timestamp("updated_at").notNull().defaultNow().onUpdateNow(),
});

export const projects = mysqlTable("projects", {
  id: int("id").autoincrement().primaryKey(),
  name: varchar("name", { length: 160 }).notNull(),
  clientOrganisationId: int("client_organisation_id").references(() => organisations.id),
  site: varchar("site", { length: 200 }).notNull().default(""),
  status: mysqlEnum("status", PROJECT_STATUSES).notNull().default("design"),
  // The site and the stock a new cut plan starts from (null: not set yet; the cut-plan page then uses
  // its own defaults). Library rows are retired rather than deleted, so these keys stay valid.
  /** The run on site, mm. */
  siteRunLengthMm: double("site_run_length_mm"),
  /** Parallel track lines, e.g. 2 for a trike's two rear wheels. */
  trackLines: int("track_lines"),
  stockSheetId: int("stock_sheet_id").references(() => stockSheets.id),
  machineId: int("machine_id").references(() => machines.id),
  createdById: int("created_by_id").references(() => users.id),
  createdAt: timestamp("created_at").notNull().defaultNow(),
  updatedAt: timestamp("updated_at").notNull().defaultNow().onUpdateNow(),
});

export const projectMembers = mysqlTable(
  "project_members",
  {
    id: int("id").autoincrement().primaryKey(),
    projectId: int("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    userId: int("user_id")
      .notNull()
      .references(() => users.id),
    role: mysqlEnum("role", MEMBER_ROLES).notNull(),
    addedById: int("added_by_id").references(() => users.id),
    createdAt: timestamp("created_at").notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("project_members_project_user").on(t.projectId, t.userId),
    index("project_members_user").on(t.userId),
  ],
);

/** Who did what to which record, when. `entity` names the table, so later tables log here too. */
export const auditLog = mysqlTable(
  "audit_log",
  {
    id: int("id").autoincrement().primaryKey(),
    actorId: int("actor_id").references(() => users.id),
    action: varchar("action", { length: 64 }).notNull(),
    entity: varchar("entity", { length: 64 }).notNull(),
    entityId: varchar("entity_id", { length: 64 }).notNull(),
    projectId: int("project_id").references(() => projects.id, { onDelete: "set null" }),
    detail: json("detail").$type<Record<string, unknown>>(),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("audit_log_entity").on(t.entity, t.entityId), index("audit_log_project").on(t.projectId)],
);

/** Sign-in attempts, kept in the database so the rate limit holds across several app instances. */
export const signInAttempts = mysqlTable(
  "sign_in_attempts",
  {
    id: int("id").autoincrement().primaryKey(),
    email: varchar("email", { length: 254 }).notNull(),
    address: varchar("address", { length: 64 }).notNull(),
    succeeded: boolean("succeeded").notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [
    index("sign_in_attempts_email").on(t.email, t.createdAt),
    index("sign_in_attempts_address").on(t.address, t.createdAt),
  ],
);

/**
 * Sessions ended by signing out. A session is a signed token the browser holds, so signing out
 * records its id here: a copy of the token kept or replayed afterwards is refused (lib/server/dal.ts)
 * and never renewed (auth.ts), whichever instance it reaches.
 */
export const endedSessions = mysqlTable(
  "ended_sessions",
  {
    sessionId: varchar("session_id", { length: 64 }).primaryKey(),
    userId: int("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    endedAt: timestamp("ended_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("ended_sessions_user").on(t.userId)],
);

export const DESIGN_MODES = ["track-for-wheel", "wheel-for-track", "partner-wheel", "twin-wheels"] as const;
export type DesignMode = (typeof DESIGN_MODES)[number];

/** A design in a project: its working draft (a design spec, editable) and, below, its revisions. */
export const designs = mysqlTable(
  "designs",
  {
    id: int("id").autoincrement().primaryKey(),
    projectId: int("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 160 }).notNull(),
    mode: mysqlEnum("mode", DESIGN_MODES).notNull(),
    /** The working draft: a design spec as JSON (validated by the engine's schema before it is stored). */
    draft: json("draft").$type<Record<string, unknown>>().notNull(),
    /** The load-path check's settings (use, load, materials, section, span, gaps; lib/validation/loads.ts), null until set. */
    loads: json("loads").$type<Record<string, unknown>>(),
    createdById: int("created_by_id").references(() => users.id),
    createdAt: timestamp("created_at").notNull().defaultNow(),
    updatedAt: timestamp("updated_at").notNull().defaultNow().onUpdateNow(),
  },
  (t) => [index("designs_project").on(t.projectId)],
);

/**
 * A saved, numbered, immutable copy of a design's spec, with its SHA-256 hash (what a client signs)
 * and the engine's summary figures. A database trigger (drizzle/0001_designs_revisions.sql) refuses
 * any UPDATE or direct DELETE, so immutability does not rest on the application alone.
 */
export const revisions = mysqlTable(
  "revisions",
  {
    id: int("id").autoincrement().primaryKey(),
    designId: int("design_id")
      .notNull()
      .references(() => designs.id, { onDelete: "cascade" }),
    number: int("number").notNull(),
    spec: json("spec").$type<Record<string, unknown>>().notNull(),
    specHash: char("spec_hash", { length: 64 }).notNull(),
    engineVersion: varchar("engine_version", { length: 32 }).notNull(),
    summary: json("summary").$type<Record<string, unknown>>().notNull(),
    /** The load-path check's settings as they were when the revision was saved (null: the library's defaults). */
    loads: json("loads").$type<Record<string, unknown>>(),
    note: varchar("note", { length: 500 }).notNull().default(""),
    createdById: int("created_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("revisions_design_number").on(t.designId, t.number), index("revisions_hash").on(t.specHash)],
);

/** Where a shop-library figure comes from: a cited source, or the trade's common practice. */
export const SOURCE_KINDS = ["published", "common-practice", "measured"] as const;

/** A sheet the shop cuts parts from, or a tread fitted to a wheel's rim. */
export const MATERIAL_KINDS = ["sheet", "tread"] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];

/** The shop library: materials with the figures the checks use, each with its source. */
export const materials = mysqlTable("materials", {
  id: int("id").autoincrement().primaryKey(),
  name: varchar("name", { length: 120 }).notNull().unique(),
  kind: mysqlEnum("kind", MATERIAL_KINDS).notNull().default("sheet"),
  thicknessMm: double("thickness_mm").notNull(),
  densityKgM3: double("density_kg_m3").notNull(),
  modulusGpa: double("modulus_gpa").notNull(),
  strengthMpa: double("strength_mpa").notNull(),
  poisson: double("poisson").notNull().default(0.3),
  /** Allowable contact (bearing) stress, MPa: for wood, compression perpendicular to the grain. Null: not known. */
  allowableMpa: double("allowable_mpa"),
  frictionStatic: double("friction_static").notNull(),
  frictionKinetic: double("friction_kinetic"),
  /** Which surfaces the friction figures are for, e.g. "rubber tread on this material, dry". */
  frictionPair: varchar("friction_pair", { length: 160 }).notNull().default(""),
  source: varchar("source", { length: 500 }).notNull(),
  sourceKind: mysqlEnum("source_kind", SOURCE_KINDS).notNull(),
  active: boolean("active").notNull().default(true),
  createdAt: timestamp("created_at").notNull().defaultNow(),
  updatedAt: timestamp("updated_at").notNull().defaultNow().onUpdateNow(),
});

export const GRAIN_DIRECTIONS = ["length", "width", "none"] as const;

/** Stock sheets the shop buys: size, material, grain direction. */
export const stockSheets = mysqlTable("stock_sheets", {
  id: int("id").autoincrement().primaryKey(),
  name: varchar("name", { length: 120 }).notNull().unique(),
  materialId: int("material_id")
    .notNull()
    .references(() => materials.id),
  lengthMm: double("length_mm").notNull(),
  widthMm: double("width_mm").notNull(),
  grain: mysqlEnum("grain", GRAIN_DIRECTIONS).notNull().default("length"),
  source: varchar("source", { length: 500 }).notNull(),
  sourceKind: mysqlEnum("source_kind", SOURCE_KINDS).notNull(),
  active: boolean("active").notNull().default(true),
  createdAt: timestamp("created_at").notNull().defaultNow(),
  updatedAt: timestamp("updated_at").notNull().defaultNow().onUpdateNow(),
});

export const MACHINE_KINDS = ["router", "laser", "waterjet", "plasma"] as const;
export type MachineKind = (typeof MACHINE_KINDS)[number];

/** Cutting machines: kind, kerf (a router's cutter diameter), bed size, smallest inside radius. */
export const machines = mysqlTable("machines", {
  id: int("id").autoincrement().primaryKey(),
  name: varchar("name", { length: 120 }).notNull().unique(),
  kind: mysqlEnum("kind", MACHINE_KINDS).notNull(),
  kerfMm: double("kerf_mm").notNull(),
  bedLengthMm: double("bed_length_mm").notNull(),
  bedWidthMm: double("bed_width_mm").notNull(),
  minInsideRadiusMm: double("min_inside_radius_mm").notNull(),
  source: varchar("source", { length: 500 }).notNull(),
  sourceKind: mysqlEnum("source_kind", SOURCE_KINDS).notNull(),
  active: boolean("active").notNull().default(true),
  createdAt: timestamp("created_at").notNull().defaultNow(),
  updatedAt: timestamp("updated_at").notNull().defaultNow().onUpdateNow(),
});

/**
 * A revision's cut plan: the settings it was made with and the nest (which part copy sits where on
 * which sheet), checked on the server before it is stored. Parts and files are rebuilt from the
 * revision's spec and these settings by the same code, so nothing derived is kept twice. The newest
 * row is the revision's current plan; older rows stay as history.
 */
export const cutPlans = mysqlTable(
  "cut_plans",
  {
    id: int("id").autoincrement().primaryKey(),
    revisionId: int("revision_id")
      .notNull()
      .references(() => revisions.id, { onDelete: "cascade" }),
    /** 1, 2, … within its revision ("cut plan 2 of R3"); the id stays the plan's address in URLs and JSON. */
    number: int("number").notNull(),
    settings: json("settings").$type<Record<string, unknown>>().notNull(),
    nest: json("nest").$type<Record<string, unknown>>().notNull(),
    summary: json("summary").$type<Record<string, unknown>>().notNull(),
    createdById: int("created_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [
    index("cut_plans_revision").on(t.revisionId),
    uniqueIndex("cut_plans_revision_number").on(t.revisionId, t.number),
  ],
);

export const END_TREATMENTS = ["flat", "half", "scale"] as const;
export type EndTreatment = (typeof END_TREATMENTS)[number];

/**
 * A request for the client's review of one saved revision: the fabricator's message and the run the
 * mock-up shows (track modes). A review is decided at most once, by a row in `sign_offs`.
 */
export const reviews = mysqlTable(
  "reviews",
  {
    id: int("id").autoincrement().primaryKey(),
    revisionId: int("revision_id")
      .notNull()
      .references(() => revisions.id),
    projectId: int("project_id")
      .notNull()
      .references(() => projects.id),
    message: varchar("message", { length: 2000 }).notNull(),
    /** The site run the mock-up lays out, mm (null for the pair modes, which have no track). */
    runLengthMm: double("run_length_mm"),
    endTreatment: mysqlEnum("end_treatment", END_TREATMENTS),
    requestedById: int("requested_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("reviews_revision").on(t.revisionId), index("reviews_project").on(t.projectId)],
);

/** The thread on a review. `atMm` pins a comment to a place along the run (a pair: the driver's turn in degrees). */
export const reviewComments = mysqlTable(
  "review_comments",
  {
    id: int("id").autoincrement().primaryKey(),
    reviewId: int("review_id")
      .notNull()
      .references(() => reviews.id),
    authorId: int("author_id")
      .notNull()
      .references(() => users.id),
    text: varchar("text", { length: 4000 }).notNull(),
    at: double("at"),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("review_comments_review").on(t.reviewId, t.createdAt)],
);

export const REVIEW_DECISIONS = ["approve", "request-changes"] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

/**
 * The client's decision on a review, one row per review (unique), never changed: a database
 * trigger (drizzle/0003_reviews_sign_offs.sql) refuses UPDATE and DELETE. The spec hash is the one
 * recomputed on the server from the stored spec when the client signed.
 */
export const signOffs = mysqlTable(
  "sign_offs",
  {
    id: int("id").autoincrement().primaryKey(),
    reviewId: int("review_id")
      .notNull()
      .references(() => reviews.id),
    revisionId: int("revision_id")
      .notNull()
      .references(() => revisions.id),
    specHash: char("spec_hash", { length: 64 }).notNull(),
    engineVersion: varchar("engine_version", { length: 32 }).notNull(),
    decision: mysqlEnum("decision", REVIEW_DECISIONS).notNull(),
    typedName: varchar("typed_name", { length: 160 }).notNull(),
    userId: int("user_id")
      .notNull()
      .references(() => users.id),
    /** The comment that came with the decision (required when changes are requested). */
    commentId: int("comment_id").references(() => reviewComments.id),
    signedAt: timestamp("signed_at", { fsp: 3 }).notNull().defaultNow(),
    address: varchar("address", { length: 64 }).notNull(),
    userAgent: varchar("user_agent", { length: 500 }).notNull(),
  },
  (t) => [uniqueIndex("sign_offs_review").on(t.reviewId), index("sign_offs_revision").on(t.revisionId, t.decision)],
);

export const DEPOSIT_STATUSES = ["on-approval", "due", "paid"] as const;
export type DepositStatus = (typeof DEPOSIT_STATUSES)[number];

/** A deposit asked for on a review: due once the client approves, paid when the payment service says so. */
export const deposits = mysqlTable(
  "deposits",
  {
    id: int("id").autoincrement().primaryKey(),
    reviewId: int("review_id")
      .notNull()
      .references(() => reviews.id),
    projectId: int("project_id")
      .notNull()
      .references(() => projects.id),
    /** In the currency's minor unit (pence, cents). */
    amountMinor: int("amount_minor").notNull(),
    currency: char("currency", { length: 3 }).notNull(),
    status: mysqlEnum("status", DEPOSIT_STATUSES).notNull().default("on-approval"),
    checkoutSessionId: varchar("checkout_session_id", { length: 255 }),
    paidAt: timestamp("paid_at", { fsp: 3 }),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { fsp: 3 }).notNull().defaultNow().onUpdateNow(),
  },
  (t) => [uniqueIndex("deposits_review").on(t.reviewId), index("deposits_project").on(t.projectId)],
);

/** Payment-service events already acted on, by their id, so a replayed event changes nothing. */
export const paymentEvents = mysqlTable("payment_events", {
  id: int("id").autoincrement().primaryKey(),
  eventId: varchar("event_id", { length: 255 }).notNull().unique(),
  type: varchar("type", { length: 100 }).notNull(),
  depositId: int("deposit_id").references(() => deposits.id),
  receivedAt: timestamp("received_at", { fsp: 3 }).notNull().defaultNow(),
});

/** What a build-log entry is about. People write the first eight; the app writes the last three itself. */
export const LOG_KINDS = [
  "note",
  "cut",
  "assembled",
  "shipped",
  "installed",
  "inspection",
  "problem",
  "fixed",
  "status",
  "review",
  "cut-plan",
] as const;
export type LogKind = (typeof LOG_KINDS)[number];
export const PEOPLE_LOG_KINDS = [
  "note",
  "cut",
  "assembled",
  "shipped",
  "installed",
  "inspection",
  "problem",
  "fixed",
] as const;

/**
 * The project's build log, newest first: notes and milestones from the shop and the crew, and the
 * app's own entries for status changes, review decisions and stored cut plans. `parts` names the
 * part ids (as engraved) an entry concerns; `detail` holds what the app's own entries need (e.g. the
 * cut plan and item of an installation tick).
 */
export const buildLogEntries = mysqlTable(
  "build_log_entries",
  {
    id: int("id").autoincrement().primaryKey(),
    projectId: int("project_id")
      .notNull()
      .references(() => projects.id),
    kind: mysqlEnum("kind", LOG_KINDS).notNull(),
    text: varchar("text", { length: 4000 }).notNull(),
    parts: json("parts").$type<string[]>().notNull(),
    cutPlanId: int("cut_plan_id").references(() => cutPlans.id),
    detail: json("detail").$type<Record<string, unknown>>(),
    authorId: int("author_id").references(() => users.id),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("build_log_project").on(t.projectId, t.createdAt), index("build_log_cut_plan").on(t.cutPlanId)],
);

/** A site photo of a build-log entry. The bytes live only in object storage, under `objectKey` (and its thumbnail's). */
export const buildLogPhotos = mysqlTable(
  "build_log_photos",
  {
    id: int("id").autoincrement().primaryKey(),
    entryId: int("entry_id")
      .notNull()
      .references(() => buildLogEntries.id),
    projectId: int("project_id")
      .notNull()
      .references(() => projects.id),
    objectKey: varchar("object_key", { length: 200 }).notNull().unique(),
    thumbKey: varchar("thumb_key", { length: 200 }).notNull().unique(),
    contentType: varchar("content_type", { length: 40 }).notNull(),
    bytes: int("bytes").notNull(),
    thumbBytes: int("thumb_bytes").notNull(),
    width: int("width").notNull(),
    height: int("height").notNull(),
    originalName: varchar("original_name", { length: 200 }).notNull().default(""),
    uploadedById: int("uploaded_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("build_log_photos_entry").on(t.entryId)],
);

export const usersRelations = relations(users, ({ one, many }) => ({
  organisation: one(organisations, { fields: [users.organisationId], references: [organisations.id] }),
  memberships: many(projectMembers),
}));

export const projectsRelations = relations(projects, ({ one, many }) => ({
  clientOrganisation: one(organisations, { fields: [projects.clientOrganisationId], references: [organisations.id] }),
  members: many(projectMembers),
}));

export const projectMembersRelations = relations(projectMembers, ({ one }) => ({
  project: one(projects, { fields: [projectMembers.projectId], references: [projects.id] }),
  user: one(users, { fields: [projectMembers.userId], references: [users.id] }),
}));

export const designsRelations = relations(designs, ({ one, many }) => ({
  project: one(projects, { fields: [designs.projectId], references: [projects.id] }),
  revisions: many(revisions),
}));

export const revisionsRelations = relations(revisions, ({ one }) => ({
  design: one(designs, { fields: [revisions.designId], references: [designs.id] }),
}));

export type BuildLogEntry = typeof buildLogEntries.$inferSelect;
export type BuildLogPhoto = typeof buildLogPhotos.$inferSelect;
export type Review = typeof reviews.$inferSelect;
export type ReviewComment = typeof reviewComments.$inferSelect;
export type SignOff = typeof signOffs.$inferSelect;
export type Deposit = typeof deposits.$inferSelect;
export type User = typeof users.$inferSelect;
export type Material = typeof materials.$inferSelect;
export type StockSheet = typeof stockSheets.$inferSelect;
export type Machine = typeof machines.$inferSelect;
export type CutPlan = typeof cutPlans.$inferSelect;
export type Design = typeof designs.$inferSelect;
export type Revision = typeof revisions.$inferSelect;
export type Project = typeof projects.$inferSelect;
export type ProjectMember = typeof projectMembers.$inferSelect;
export type Organisation = typeof organisations.$inferSelect;
