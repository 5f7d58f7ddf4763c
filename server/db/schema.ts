// The whole database schema: better-auth's tables and Borrowline's own.
// SI units in every numeric column (metres, m/s); Stimp in feet as the trade quotes it.
// Over 300 lines on purpose (issue 16): drizzle.config.ts generates the migrations from this one file, and the
// tables' foreign keys refer to each other; one table per file would only spread that one declaration.
import { sql } from "drizzle-orm";
import {
  type AnyPgColumn,
  boolean,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { user } from "./auth-schema";

export * from "./auth-schema";

const createdAt = () => timestamp("created_at", { withTimezone: true }).defaultNow().notNull();
const userRef = (name: string) =>
  text(name)
    .notNull()
    .references(() => user.id, { onDelete: "cascade" });

export const userPreferences = pgTable("user_preferences", {
  userId: text("user_id")
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  units: text("units").notNull().default("imperial"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).defaultNow().notNull(),
});

/** A saved putting surface. The height map (a later feature) is a validated grid in JSON. */
export const greens = pgTable(
  "greens",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: userRef("owner_id"),
    name: text("name").notNull(),
    locationNote: text("location_note"),
    heightMap: jsonb("height_map"),
    /** Shared with this squad (its players see it, log on it and read on its map); null: the owner's alone. */
    squadId: uuid("squad_id").references((): AnyPgColumn => squads.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("greens_owner_idx").on(t.ownerId), index("greens_squad_idx").on(t.squadId)],
);

export const stimpReadings = pgTable(
  "stimp_readings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    greenId: uuid("green_id")
      .notNull()
      .references(() => greens.id, { onDelete: "cascade" }),
    measuredOn: date("measured_on").notNull(),
    stimpFt: doublePrecision("stimp_ft").notNull(),
    upFt: doublePrecision("up_ft"),
    downFt: doublePrecision("down_ft"),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [index("stimp_readings_green_idx").on(t.greenId, t.measuredOn)],
);

export const savedReads = pgTable(
  "saved_reads",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: userRef("user_id"),
    greenId: uuid("green_id").references(() => greens.id, { onDelete: "set null" }),
    label: text("label"),
    input: jsonb("input").notNull(),
    result: jsonb("result").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("saved_reads_user_idx").on(t.userId, t.createdAt)],
);

export const practiceSessions = pgTable(
  "practice_sessions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    playerId: userRef("player_id"),
    date: date("date").notNull(),
    greenId: uuid("green_id").references(() => greens.id, { onDelete: "set null" }),
    stimpFt: doublePrecision("stimp_ft"),
    conditions: text("conditions"),
    tags: jsonb("tags")
      .$type<string[]>()
      .notNull()
      .default(sql`'[]'::jsonb`),
    notes: text("notes"),
    createdAt: createdAt(),
  },
  (t) => [index("practice_sessions_player_date_idx").on(t.playerId, t.date)],
);

export const putts = pgTable(
  "putts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    sessionId: uuid("session_id")
      .notNull()
      .references(() => practiceSessions.id, { onDelete: "cascade" }),
    playerId: userRef("player_id"),
    /** Client-made id so a retried request after a dropped connection is stored once. */
    clientId: uuid("client_id"),
    distanceM: doublePrecision("distance_m").notNull(),
    holed: boolean("holed").notNull(),
    missSide: text("miss_side"),
    /** Signed: negative = short of the hole, positive = past it. */
    missLengthM: doublePrecision("miss_length_m"),
    breakType: text("break_type"),
    assignmentId: uuid("assignment_id"),
    rungIndex: integer("rung_index"),
    createdAt: createdAt(),
  },
  (t) => [
    index("putts_session_idx").on(t.sessionId, t.createdAt),
    index("putts_player_idx").on(t.playerId, t.distanceM),
    index("putts_assignment_idx").on(t.assignmentId),
    uniqueIndex("putts_client_id_idx").on(t.playerId, t.clientId),
  ],
);

export const rounds = pgTable(
  "rounds",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    playerId: userRef("player_id"),
    date: date("date").notNull(),
    course: text("course"),
    notes: text("notes"),
    createdAt: createdAt(),
  },
  (t) => [index("rounds_player_date_idx").on(t.playerId, t.date)],
);

export const roundHoles = pgTable(
  "round_holes",
  {
    roundId: uuid("round_id")
      .notNull()
      .references(() => rounds.id, { onDelete: "cascade" }),
    holeNumber: integer("hole_number").notNull(),
    firstPuttM: doublePrecision("first_putt_m").notNull(),
    putts: integer("putts").notNull(),
    leftAfterFirstM: doublePrecision("left_after_first_m"),
  },
  (t) => [primaryKey({ columns: [t.roundId, t.holeNumber] })],
);

export const squads = pgTable(
  "squads",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    coachId: userRef("coach_id"),
    name: text("name").notNull(),
    description: text("description"),
    createdAt: createdAt(),
  },
  (t) => [index("squads_coach_idx").on(t.coachId)],
);

export const squadMembers = pgTable(
  "squad_members",
  {
    squadId: uuid("squad_id")
      .notNull()
      .references(() => squads.id, { onDelete: "cascade" }),
    playerId: userRef("player_id"),
    joinedAt: timestamp("joined_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [primaryKey({ columns: [t.squadId, t.playerId] }), index("squad_members_player_idx").on(t.playerId)],
);

export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    squadId: uuid("squad_id")
      .notNull()
      .references(() => squads.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    /** SHA-256 of the e-mailed link's token; the token itself only travels in the e-mail, so it proves the address. */
    tokenHash: text("token_hash").notNull().unique(),
    /** SHA-256 of the link the coach may copy and pass on by hand: it does not prove the address. */
    shareTokenHash: text("share_token_hash").unique(),
    status: text("status").notNull().default("pending"),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedBy: text("accepted_by").references(() => user.id, { onDelete: "set null" }),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_squad_idx").on(t.squadId)],
);

/** A coach's graded drill; rungs are an ordered JSON list validated by the shared schema. */
export const ladders = pgTable(
  "ladders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: userRef("owner_id"),
    name: text("name").notNull(),
    description: text("description"),
    failRule: text("fail_rule").notNull(),
    rungs: jsonb("rungs").notNull(),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index("ladders_owner_idx").on(t.ownerId)],
);

/** A ladder given to one player; it keeps a copy of the ladder as it was when assigned. */
export const ladderAssignments = pgTable(
  "ladder_assignments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ladderId: uuid("ladder_id").references(() => ladders.id, { onDelete: "set null" }),
    playerId: userRef("player_id"),
    assignedBy: userRef("assigned_by"),
    squadId: uuid("squad_id").references(() => squads.id, { onDelete: "set null" }),
    ladder: jsonb("ladder").notNull(),
    dueDate: date("due_date"),
    sessionId: uuid("session_id").references(() => practiceSessions.id, { onDelete: "set null" }),
    status: text("status").notNull().default("assigned"),
    lastActivityAt: timestamp("last_activity_at", { withTimezone: true }),
    completedAt: timestamp("completed_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("ladder_assignments_player_idx").on(t.playerId), index("ladder_assignments_by_idx").on(t.assignedBy)],
);

export const trainingAttempts = pgTable(
  "training_attempts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: userRef("user_id"),
    level: text("level").notNull(),
    putt: jsonb("putt").notNull(),
    guess: jsonb("guess").notNull(),
    aimErrorM: doublePrecision("aim_error_m").notNull(),
    paceErrorM: doublePrecision("pace_error_m").notNull(),
    score: integer("score").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("training_attempts_user_idx").on(t.userId, t.createdAt)],
);

/** A coach's dated note on a player of their squads; the player reads it (issue 15). */
export const playerNotes = pgTable(
  "player_notes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    playerId: userRef("player_id"),
    authorId: userRef("author_id"),
    body: text("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("player_notes_player_idx").on(t.playerId, t.createdAt)],
);

/**
 * Every admin action (who, what, when). The actor and target e-mails are copied in, so the record still
 * reads after an account is gone; the ids are kept without foreign keys for the same reason.
 */
export const adminAudit = pgTable(
  "admin_audit",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    actorId: text("actor_id").notNull(),
    actorEmail: text("actor_email").notNull(),
    action: text("action").notNull(),
    targetId: text("target_id"),
    targetEmail: text("target_email"),
    detail: jsonb("detail"),
    createdAt: createdAt(),
  },
  (t) => [index("admin_audit_created_idx").on(t.createdAt)],
);

/**
 * The local e-mail fake's inbox (no SMTP_URL): every message a server's fake received, so that any server on the
 * database shows the same mailbox (behind a load balancer the mail and the admin reading it may be on different
 * servers). Only the newest few hundred are kept; only an admin reads it (routes/dev).
 */
export const devMail = pgTable(
  "dev_mail",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    fromAddress: text("from_address").notNull(),
    toAddresses: jsonb("to_addresses").$type<string[]>().notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html").notNull(),
    receivedAt: timestamp("received_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("dev_mail_received_idx").on(t.receivedAt)],
);

/**
 * A practice plan under way (issue 17): the proposal as it stood when the player started it or a coach adopted it
 * (shared/schemas/practice-plan.ts), with the runnable ladder it became. The newest row is the player's plan.
 */
export const practicePlans = pgTable(
  "practice_plans",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    playerId: userRef("player_id"),
    startedBy: userRef("started_by"),
    startedOn: date("started_on").notNull(),
    plan: jsonb("plan").notNull(),
    assignmentId: uuid("assignment_id").references(() => ladderAssignments.id, { onDelete: "set null" }),
    ladderId: uuid("ladder_id").references(() => ladders.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("practice_plans_player_idx").on(t.playerId, t.createdAt)],
);
