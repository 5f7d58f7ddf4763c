import { z } from "zod";
import { timestampSchema } from "./common";
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

export const squadMemberSchema = z.object({ id: z.string(), name: z.string(), email: z.string(), joinedAt: timestampSchema });
export type SquadMember = z.output<typeof squadMemberSchema>;

/** A coach's view of their squad. */
const person = z.object({ id: z.string(), name: z.string() });
export const squadSchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string().nullable(),
  coach: person,
  createdAt: timestampSchema,
  members: z.array(squadMemberSchema),
  counts: z.object({ members: z.number().int(), pendingInvitations: z.number().int(), assignments: z.number().int() }),
});
export type Squad = z.output<typeof squadSchema>;

/** A player's view of a squad they belong to: no other members' details. */
export const squadMembershipSchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string().nullable(),
  coach: person,
  joinedAt: timestampSchema,
  counts: z.object({ members: z.number().int() }),
});
export type SquadMembership = z.output<typeof squadMembershipSchema>;
/** GET /api/squads: a coach's (or admin's) own squads, or the squads a player belongs to. */
export const squadListSchema = z.object({ squads: z.union([z.array(squadSchema), z.array(squadMembershipSchema)]) });

export const invitationSchema = z.object({
  id: z.string(),
  squadId: z.string(),
  email: z.string(),
  status: z.enum(INVITATION_STATUSES),
  expiresAt: timestampSchema,
  createdAt: timestampSchema,
  acceptedAt: timestampSchema.nullable(),
  acceptedBy: z.string().nullable(),
});
export type Invitation = z.output<typeof invitationSchema>;
export const invitationListSchema = z.object({ invitations: z.array(invitationSchema) });
/** POST /api/squads/:id/invitations and …/resend: the invitation and the share link for the coach to pass on. */
export const sentInvitationSchema = z.object({ invitation: invitationSchema, link: z.string() });
/** POST /api/invitations/:token/accept. */
export const acceptedInvitationSchema = z.object({
  squad: z.object({ id: z.string(), name: z.string(), coach: person }),
  joinedAt: timestampSchema,
});
export type AcceptedInvitation = z.output<typeof acceptedInvitationSchema>;

/** GET /api/invitations/:token — what the join page shows before anyone signs in. */
export const invitationPreviewSchema = z.object({
  squad: z.object({ name: z.string() }),
  coach: z.object({ name: z.string() }),
  email: z.string(),
  status: z.enum(INVITATION_STATUSES),
  expiresAt: timestampSchema,
  /** True for the e-mailed link, whose use confirms the address; false for a link the coach passed on by hand. */
  provesAddress: z.boolean(),
});
export type InvitationPreview = z.output<typeof invitationPreviewSchema>;

/** GET /api/coach/squads/:id/overview (and its CSV export): "recent" is the last `days` days up to today. */
export const squadOverviewQuerySchema = z.object({ days: z.coerce.number().int().min(7).max(120).default(28) }).strict();
export type SquadOverviewQuery = z.infer<typeof squadOverviewQuerySchema>;

const overviewRate = z.object({ attempts: z.number().int(), made: z.number().int(), rate: z.number().nullable() });
export const squadOverviewPlayerSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  recent: z.object({
    sessions: z.number().int(),
    putts: z.number().int(),
    strokesGainedPerPutt: z.number().nullable(),
    lastSession: z.string().nullable(),
  }),
  past: z.object({ putts: z.number().int(), strokesGainedPerPutt: z.number().nullable() }),
  /** Per band of the overview: the recent period against everything before it. */
  bands: z.array(z.object({ recent: overviewRate, past: overviewRate })),
  ladders: z.object({
    active: z.number().int(),
    completed: z.number().int(),
    overdue: z.number().int(),
    latest: z
      .object({ name: z.string(), status: z.string(), overdue: z.boolean(), rungReached: z.number().int(), rungsTotal: z.number().int() })
      .nullable(),
  }),
});
export type SquadOverviewPlayer = z.output<typeof squadOverviewPlayerSchema>;
export const squadOverviewSchema = z.object({
  squad: z.object({ id: z.string(), name: z.string() }),
  days: z.number().int(),
  recentFrom: z.string(),
  today: z.string(),
  bands: z.array(z.object({ fromM: z.number(), toM: z.number().nullable() })),
  players: z.array(squadOverviewPlayerSchema),
});
export type SquadOverview = z.output<typeof squadOverviewSchema>;
