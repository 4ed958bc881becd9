/** Response shapes of the account, team, auth and outbox routes (server/routes/{me,auth,team,account,outbox}.ts). */
export type TeamRole = 'admin' | 'engineer' | 'reviewer';

/** GET /api/me, POST /api/auth/login, PATCH /api/account, POST /api/invitations/:token/accept. */
export interface Me {
  user: { id: string; email: string; name: string; role: TeamRole };
  team: { id: string; name: string };
}

export interface TeamMember {
  id: string;
  email: string;
  name: string;
  role: TeamRole;
}

/** GET /api/team. */
export interface TeamResponse {
  team: { name: string };
  members: TeamMember[];
}

/** One row of GET /api/team/invitations. */
export interface PendingInvitation {
  id: string;
  email: string;
  role: TeamRole;
  expiresAt: string;
  expired: boolean;
}

/** GET /api/invitations/:token. */
export interface InvitationInfo {
  email: string;
  role: string;
  teamName: string;
}

/** One row of GET /api/account/tokens; POST adds the plain `token`, shown once. */
export interface ApiTokenRow {
  id: string;
  name: string;
  prefix: string;
  lastUsedAt: string | null;
  createdAt: string;
}

/** One row of GET /api/outbox. */
export interface MailRow {
  id: string;
  from: string;
  to: string[];
  subject: string;
  receivedAt: string;
}

/** GET /api/outbox/:id. */
export interface MailDetail extends MailRow {
  text: string;
  html: string | null;
  raw: string;
}
