import type { z } from "zod";
import crypto from "node:crypto";
import { and, desc, eq, gt, ne, or, sql } from "drizzle-orm";
import { ERROR_CODES } from "../../../shared/errors";
import { idSchema } from "../../../shared/schemas/common";
import {
  invitationInputSchema,
  invitationTokenSchema,
  type Invitation,
  type InvitationPreview,
  type InvitationStatus,
} from "../../../shared/schemas/squads";
import type { AppDeps } from "../../deps";
import type { Db } from "../../db/client";
import { invitations, squadMembers, squads, user } from "../../db/schema";
import { conflict, forbidden, HttpError, notFound } from "../../lib/http-error";
import { linkBase } from "../../lib/link-origin";
import { linkMail } from "../../lib/mailer";
import { currentUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import type { Ctx } from "../../lib/route";
import { findOwnSquad, ownedBy } from "../squads/squad-access";

export const INVITATION_DAYS = 14;

type InvitationRow = typeof invitations.$inferSelect;

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token).digest("hex");
}

/** "expired" is not stored: a pending invitation past its expiry reads as expired. */
function statusOf(row: InvitationRow, now = new Date()): InvitationStatus {
  if (row.status === "pending" && row.expiresAt.getTime() <= now.getTime()) return "expired";
  return row.status as InvitationStatus;
}

function invitationView(row: InvitationRow): Invitation {
  return {
    id: row.id,
    squadId: row.squadId,
    email: row.email,
    status: statusOf(row),
    expiresAt: row.expiresAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    acceptedAt: row.acceptedAt?.toISOString() ?? null,
    acceptedBy: row.acceptedBy,
  };
}

/** Why an invitation can no longer be accepted, or null when it still can. */
function refusal(status: InvitationStatus): string | null {
  if (status === "accepted") return "This invitation has already been used.";
  if (status === "revoked") return "This invitation was withdrawn by the coach.";
  if (status === "expired") return "This invitation has expired. Ask your coach for a new one.";
  return null;
}

type SquadRow = typeof squads.$inferSelect;

/**
 * Two single-use links to one invitation, the database keeping only their SHA-256: the e-mailed one (its
 * token travels only in the e-mail, so following it proves the address) and a share link returned to the
 * inviting coach to pass on by hand (it proves nothing, so the player must confirm their address first).
 * Inviting the same address again (or resending) makes fresh links and withdraws the older ones, so an old
 * link answers "withdrawn". Returns the new invitation and its share link.
 */
async function sendInvitation({ database, mailer, logger }: AppDeps, squad: SquadRow, email: string, base: string) {
  const db = database.db;
  const token = crypto.randomBytes(32).toString("base64url");
  const shareToken = crypto.randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
  const [row] = await db
    .insert(invitations)
    .values({ squadId: squad.id, email, tokenHash: hashToken(token), shareTokenHash: hashToken(shareToken), expiresAt })
    .returning();
  const [coach] = await db.select({ name: user.name }).from(user).where(eq(user.id, squad.coachId));
  const link = `${base}/join/${token}`;
  const shareLink = `${base}/join/${shareToken}`;

  const intro =
    `${coach?.name ?? "Your coach"} invites you to join the squad "${squad.name}" on Borrowline, to run the putting ladders ` +
    `they set and share your progress with them. The invitation is for ${email} and can be used once, until ${expiresAt.toISOString().slice(0, 10)}.`;
  try {
    await mailer.send(linkMail(email, `Join ${squad.name} on Borrowline`, intro, "Join the squad", link));
  } catch (err) {
    await db.delete(invitations).where(eq(invitations.id, row!.id));
    logger.error({ err, to: email }, "invitation e-mail could not be sent");
    throw new HttpError(503, ERROR_CODES.internal, "The invitation e-mail could not be sent. Try again in a moment.");
  }
  await db
    .update(invitations)
    .set({ status: "revoked" })
    .where(
      and(eq(invitations.squadId, squad.id), eq(invitations.email, email), eq(invitations.status, "pending"), ne(invitations.id, row!.id)),
    );
  return { invitation: invitationView(row!), link: shareLink };
}

export function createInvitation(deps: AppDeps) {
  const db = deps.database.db;
  return async ({ req, body }: Ctx<z.infer<typeof invitationInputSchema>>) => {
    const me = currentUser(req);
    const squad = await findOwnSquad(db, me, parseOrThrow(idSchema, req.params.id, "id"));
    const { email } = body;

    const [member] = await db
      .select({ id: user.id })
      .from(squadMembers)
      .innerJoin(user, eq(user.id, squadMembers.playerId))
      .where(and(eq(squadMembers.squadId, squad.id), sql`lower(${user.email}) = ${email}`));
    if (member) throw conflict(`${email} is already in ${squad.name}.`);

    // The inviting coach gets the link too, to pass on by hand (no mailbox needed for the demo).
    const sent = await sendInvitation(deps, squad, email, linkBase(deps.config.links, req));
    return sent;
  };
}

/**
 * Sends a not-yet-accepted invitation again with a new token: the old link is withdrawn (it answers 409
 * "withdrawn"), the new one runs 14 days from now. The answer carries the new link for the coach to copy.
 */
export function resendInvitation(deps: AppDeps) {
  const db = deps.database.db;
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = parseOrThrow(idSchema, req.params.id, "id");
    const [found] = await db
      .select({ invitation: invitations, squad: squads })
      .from(invitations)
      .innerJoin(squads, eq(squads.id, invitations.squadId))
      .where(and(eq(invitations.id, id), ownedBy(squads.coachId, me)));
    if (!found) throw notFound("Invitation");
    if (found.invitation.status === "accepted") throw conflict("This invitation was already accepted; there is nothing to resend.");
    const sent = await sendInvitation(deps, found.squad, found.invitation.email, linkBase(deps.config.links, req));
    // A revoked or expired invitation resent: the old row is withdrawn too (it may not have been pending).
    await db
      .update(invitations)
      .set({ status: "revoked" })
      .where(and(eq(invitations.id, id), ne(invitations.status, "accepted")));
    return sent;
  };
}

export function listInvitations(db: Db) {
  return async ({ req }: Ctx) => {
    const squad = await findOwnSquad(db, currentUser(req), parseOrThrow(idSchema, req.params.id, "id"));
    const rows = await db
      .select()
      .from(invitations)
      .where(eq(invitations.squadId, squad.id))
      .orderBy(desc(invitations.createdAt), invitations.id);
    return { invitations: rows.map(invitationView) };
  };
}

/** Withdraws a pending (or expired) invitation; revoking twice is fine; an accepted one is 409. */
export function revokeInvitation(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = parseOrThrow(idSchema, req.params.id, "id");
    const [found] = await db
      .select({ invitation: invitations })
      .from(invitations)
      .innerJoin(squads, eq(squads.id, invitations.squadId))
      .where(and(eq(invitations.id, id), ownedBy(squads.coachId, me)));
    if (!found) throw notFound("Invitation");
    if (found.invitation.status === "accepted")
      throw conflict("This invitation was already accepted; remove the member from the squad instead.");
    await db.update(invitations).set({ status: "revoked" }).where(eq(invitations.id, id));
  };
}

async function findByToken(db: Db, raw: unknown) {
  const token = parseOrThrow(invitationTokenSchema, raw, "token");
  const [found] = await db
    .select({ invitation: invitations, squad: squads, coachName: user.name })
    .from(invitations)
    .innerJoin(squads, eq(squads.id, invitations.squadId))
    .innerJoin(user, eq(user.id, squads.coachId))
    .where(or(eq(invitations.tokenHash, hashToken(token)), eq(invitations.shareTokenHash, hashToken(token))));
  if (!found) throw notFound("Invitation");
  /** True for the e-mailed link: only someone who reads that address's mail has it. */
  const provesAddress = found.invitation.tokenHash === hashToken(token);
  return { ...found, provesAddress };
}

/** Public: the join page shows whom the link is for before anyone signs in. */
export function previewInvitation(db: Db) {
  return async ({ req }: Ctx) => {
    const { invitation, squad, coachName, provesAddress } = await findByToken(db, req.params.token);
    const preview: InvitationPreview = {
      squad: { name: squad.name },
      coach: { name: coachName },
      email: invitation.email,
      status: statusOf(invitation),
      expiresAt: invitation.expiresAt.toISOString(),
      provesAddress,
    };
    return preview;
  };
}

/**
 * The signed-in player joins the squad. The account's e-mail must be the invited one (compared without
 * case) and confirmed — following the e-mailed link is that confirmation; the coach's share link is not.
 * Coach and admin accounts cannot join squads. Used, withdrawn or expired links answer 409.
 */
export function acceptInvitation(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const { invitation, squad, coachName, provesAddress } = await findByToken(db, req.params.token);
    const why = refusal(statusOf(invitation));
    if (why) throw conflict(why);
    if (me.role !== "player") throw forbidden(`Only player accounts can join a squad; you are signed in as a ${me.role}.`);
    if (me.email.toLowerCase() !== invitation.email.toLowerCase()) {
      throw forbidden(`This invitation was sent to ${invitation.email}. Sign in with that e-mail address to accept it.`);
    }
    // Read from the database, not the session's cached copy: the e-mail must really be confirmed.
    const [account] = await db.select({ emailVerified: user.emailVerified }).from(user).where(eq(user.id, me.id));
    if (!account?.emailVerified && !provesAddress)
      throw forbidden("Confirm your e-mail address first (open the link we sent you), then accept the invitation.");
    const joinedAt = await db.transaction(async (tx) => {
      // The status guard makes the token single-use even when two accepts race.
      const used = await tx
        .update(invitations)
        .set({ status: "accepted", acceptedBy: me.id, acceptedAt: new Date() })
        .where(and(eq(invitations.id, invitation.id), eq(invitations.status, "pending"), gt(invitations.expiresAt, new Date())))
        .returning({ id: invitations.id });
      if (used.length === 0) throw conflict("This invitation has already been used.");
      // Following the link that was e-mailed to this exact address proves the address: no second confirmation.
      if (provesAddress)
        await tx
          .update(user)
          .set({ emailVerified: true })
          .where(and(eq(user.id, me.id), eq(user.emailVerified, false)));
      await tx.insert(squadMembers).values({ squadId: squad.id, playerId: me.id }).onConflictDoNothing();
      const [m] = await tx
        .select({ joinedAt: squadMembers.joinedAt })
        .from(squadMembers)
        .where(and(eq(squadMembers.squadId, squad.id), eq(squadMembers.playerId, me.id)));
      return m!.joinedAt;
    });
    return {
      squad: { id: squad.id, name: squad.name, coach: { id: squad.coachId, name: coachName } },
      joinedAt: joinedAt.toISOString(),
    };
  };
}
