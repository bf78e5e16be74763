import { z } from 'zod';
import { PG_INT_MAX, TOO_LARGE } from './ids';
import { emailAddress as email } from './email';
import { DATE_ORDERS, type DateOrder } from '../domain/iso-date';
import { CLOCK_STYLES, type ClockStyle } from '../domain/clock';
import { TIME_ZONE_MAX } from '../domain/time-zone';

export const ROLES = ['coach', 'assistant', 'client'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

const password = z
  .string()
  .min(10, { message: 'Use at least 10 characters' })
  .max(200, { message: 'Use at most 200 characters' });
const personName = z.string().trim().min(1, { message: 'Enter a name' }).max(120);

/** A session not kept signed in (a shared computer) also ends after this many hours without a request. */
export const UNKEPT_SESSION_IDLE_HOURS = 12;

/**
 * Keep this device signed in (the default): for two weeks from its last use. False, for a shared or kitchen
 * computer: the session ends when the browser closes (or after UNKEPT_SESSION_IDLE_HOURS unused), and the app keeps
 * no plan or list on the device for use offline. Sent by the sign-in and the invitation's join.
 */
const staySignedIn = z.boolean({ message: 'Say whether to keep this device signed in: true or false' }).optional();

export const loginSchema = z.object({
  email,
  password: z.string().min(1, { message: 'Enter your password' }).max(200),
  staySignedIn,
});
export type LoginInput = z.infer<typeof loginSchema>;

export const registerSchema = z.object({
  name: personName,
  email,
  password,
  businessName: z.string().trim().min(1, { message: 'Enter your business name' }).max(120),
  /** How the new workspace writes dates (the sign-up form sends its device's order; a setting afterwards). */
  dateOrder: z.enum(DATE_ORDERS, { message: 'Choose how dates are written: month-day or day-month' }).optional(),
  /** How the new workspace writes times (the sign-up form sends its device's style; a setting afterwards). */
  clock: z.enum(CLOCK_STYLES, { message: 'Choose how times are written: 24h or 12h' }).optional(),
  /**
   * The device's time zone, the kitchen's until the coach changes it in Settings. Not typed by anyone: a name this
   * server's engine does not know (a newer or older zone database than the browser's) is left unset, not refused.
   */
  timeZone: z.string().max(TIME_ZONE_MAX).optional().catch(undefined),
});
export type RegisterInput = z.infer<typeof registerSchema>;

export const createInvitationSchema = z.object({
  email,
  /** A second coach has every right the first has (health notes included); a kitchen assistant never sees them. */
  role: z.enum(['coach', 'assistant', 'client'], { message: 'Choose coach, kitchen assistant or client' }),
  /** For a client invitation: the client profile this person will see. */
  clientId: z.number().int().positive().max(PG_INT_MAX, TOO_LARGE).optional(),
});
export type CreateInvitationInput = z.infer<typeof createInvitationSchema>;

/** PATCH /api/members/:id: a team member's role (a client's access stays tied to their profile). */
export const changeMemberRoleSchema = z.object({
  role: z.enum(['coach', 'assistant'], { message: 'Choose coach or kitchen assistant' }),
});
export type ChangeMemberRoleInput = z.infer<typeof changeMemberRoleSchema>;

export const acceptInvitationSchema = z.object({ name: personName, password, staySignedIn });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, { message: 'Enter your current password' }).max(200),
  newPassword: password,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** What changing the password did besides: the other devices signed in as this person were signed out. */
export interface PasswordChangedDto {
  otherDevicesSignedOut: number;
}

/**
 * A device (a browser session) signed in as this person, in any of their workspaces. `id` is a handle for ending it,
 * not the session's secret id. `device` and `signedInAt` are null for a session started before they were recorded;
 * `lastActiveAt` is within a minute of the last request made with it (the current one: now).
 */
export interface SignedInDeviceDto {
  id: string;
  current: boolean;
  device: string | null;
  signedInAt: string | null;
  lastActiveAt: string;
  /** Signed in without "Keep me signed in": it ends when that browser closes. */
  untilBrowserCloses: boolean;
}
export const deviceIdSchema = z.string().regex(/^[0-9a-f]{24}$/, { message: 'Not a signed-in device of yours' });

export interface DevicesSignedOutDto {
  signedOut: number;
}

export const requestPasswordResetSchema = z.object({ email });
export const resetPasswordSchema = z.object({ token: z.string().min(20).max(200), newPassword: password });

export const UNIT_SYSTEMS = ['us', 'metric'] as const;
export const TEMP_UNITS = ['F', 'C'] as const;
export const updatePreferencesSchema = z.object({
  unitSystem: z.enum(UNIT_SYSTEMS).optional(),
  tempUnit: z.enum(TEMP_UNITS).optional(),
});
export type UpdatePreferencesInput = z.infer<typeof updatePreferencesSchema>;

export interface MeDto {
  id: number;
  email: string;
  name: string;
  role: Role;
  workspaceId: number;
  workspaceName: string;
  /** The seeded demo workspace (invented people and recipes). */
  workspaceIsDemo: boolean;
  clientId: number | null;
  unitSystem: (typeof UNIT_SYSTEMS)[number];
  tempUnit: (typeof TEMP_UNITS)[number];
  /** How the workspace writes dates in words (the coach's setting; every page and document follows it). */
  dateOrder: DateOrder;
  /** How the workspace writes a time of day (the coach's setting; every page and document follows it). */
  clock: ClockStyle;
  /**
   * The kitchen's time zone (IANA name, the coach's setting), or null when not set: the bake run and its cooling
   * record read the kitchen's clock in it, whatever zone the reading device is in.
   */
  timeZone: string | null;
  /**
   * This session was kept signed in at sign-in (the default). False on a shared computer: the session ends when the
   * browser closes, and the app keeps no plan or list on the device for use offline (its own files only).
   */
  staysSignedIn: boolean;
}

/** One of the workspaces a person belongs to (GET /api/auth/workspaces): someone may work for two coaches. */
export interface MyWorkspaceDto {
  workspaceId: number;
  name: string;
  role: Role;
  isDemo: boolean;
  /** The workspace this session works in. */
  current: boolean;
}

/** PUT /api/auth/workspace: work in another of one's workspaces. */
export const chooseWorkspaceSchema = z.object({
  workspaceId: z.number({ message: 'Choose a workspace' }).int().positive().max(PG_INT_MAX, TOO_LARGE),
});

/** Someone with access to the workspace (the Team page; the prep-day papers choose assistants from these). */
export interface MemberDto {
  /** The membership's id (DELETE /api/members/:id removes this access). */
  id: number;
  userId: number;
  name: string;
  email: string;
  role: Role;
  /** For a client member: their client profile and its name. */
  clientId: number | null;
  clientName: string | null;
  joinedAt: string;
  /** The person asking. */
  you: boolean;
}

export interface InvitationDto {
  id: number;
  email: string;
  role: Role;
  expiresAt: string;
  acceptedAt: string | null;
  /** Only present in the response that creates it: the token is stored hashed. */
  link?: string;
}

/** POST /api/invitations/clients: invite these client profiles at once, each at the e-mail on their profile. */
export const inviteClientsSchema = z.object({
  clientIds: z
    .array(z.number().int().positive().max(PG_INT_MAX, TOO_LARGE), { message: 'List the clients to invite' })
    .min(1, { message: 'Choose at least one client' })
    .max(500, { message: 'At most 500 clients at once' }),
});
export type InviteClientsInput = z.infer<typeof inviteClientsSchema>;

/** Why a client asked for was not invited. */
export type InviteSkipReason = 'archived' | 'no-email' | 'joined' | 'invited' | 'member';

export interface InviteClientsResultDto {
  invited: { clientId: number; name: string; email: string }[];
  skipped: { clientId: number; name: string; reason: InviteSkipReason }[];
  /** The outbox batch of the invitation e-mails (null when none was sent). */
  batchId: string | null;
}
