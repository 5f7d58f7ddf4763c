import { z } from "zod";
import { multilineText, plainText } from "./text";

/** A user id as better-auth makes them (not a uuid). */
export const userIdSchema = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/, "Not a user id");

export const squadInputSchema = z
  .object({
    name: plainText(80, 1, "Give the squad a name"),
    description: multilineText(500).optional(),
  })
  .strict();
export type SquadInput = z.infer<typeof squadInputSchema>;

/** PATCH: any of the fields; a null description clears it. */
export const squadPatchSchema = z
  .object({
    name: plainText(80, 1, "Give the squad a name").optional(),
    description: multilineText(500).nullable().optional(),
  })
  .strict()
  .refine((p) => p.name !== undefined || p.description !== undefined, { message: "Send name or description", path: ["body"] });
export type SquadPatch = z.infer<typeof squadPatchSchema>;

export const invitationInputSchema = z
  .object({
    email: z
      .email("Enter a valid e-mail address")
      .max(254)
      .transform((e) => e.trim().toLowerCase()),
  })
  .strict();
export type InvitationInput = z.infer<typeof invitationInputSchema>;

/** The token from an invitation link: 32 random bytes in base64url. */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, "Not an invitation token");

export const INVITATION_STATUSES = ["pending", "accepted", "expired", "revoked"] as const;
export type InvitationStatus = (typeof INVITATION_STATUSES)[number];

export type SquadMember = { id: string; name: string; email: string; joinedAt: string };

/** A coach's view of their squad. */
export type Squad = {
  id: string;
  name: string;
  description: string | null;
  coach: { id: string; name: string };
  createdAt: string;
  members: SquadMember[];
  counts: { members: number; pendingInvitations: number; assignments: number };
};

/** A player's view of a squad they belong to: no other members' details. */
export type SquadMembership = {
  id: string;
  name: string;
  description: string | null;
  coach: { id: string; name: string };
  joinedAt: string;
  counts: { members: number };
};

export type Invitation = {
  id: string;
  squadId: string;
  email: string;
  status: InvitationStatus;
  expiresAt: string;
  createdAt: string;
  acceptedAt: string | null;
  acceptedBy: string | null;
};

/** GET /api/invitations/:token — what the join page shows before anyone signs in. */
export type InvitationPreview = {
  squad: { name: string };
  coach: { name: string };
  email: string;
  status: InvitationStatus;
  expiresAt: string;
  /** True for the e-mailed link, whose use confirms the address; false for a link the coach passed on by hand. */
  provesAddress: boolean;
};

/** GET /api/coach/squads/:id/overview (and its CSV export): "recent" is the last `days` days up to today. */
export const squadOverviewQuerySchema = z
  .object({ days: z.coerce.number().int().min(7).max(120).default(28) })
  .strict();
export type SquadOverviewQuery = z.infer<typeof squadOverviewQuerySchema>;

type OverviewRate = { attempts: number; made: number; rate: number | null };
export type SquadOverviewPlayer = {
  id: string;
  name: string;
  email: string;
  recent: { sessions: number; putts: number; strokesGainedPerPutt: number | null; lastSession: string | null };
  past: { putts: number; strokesGainedPerPutt: number | null };
  /** Per band of the overview: the recent period against everything before it. */
  bands: { recent: OverviewRate; past: OverviewRate }[];
  ladders: { active: number; completed: number; overdue: number; latest: { name: string; status: string; overdue: boolean; rungReached: number; rungsTotal: number } | null };
};
export type SquadOverview = {
  squad: { id: string; name: string };
  days: number;
  recentFrom: string;
  today: string;
  bands: { fromM: number; toM: number | null }[];
  players: SquadOverviewPlayer[];
};
