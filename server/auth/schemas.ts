/** Request bodies for the account routes; messages read as "field: rule". */
import { z } from 'zod';
import { TEAM_ROLES } from '../entities/user.ts';
import { SHARE_ACCESS } from '../entities/study-share.ts';
import { STUDY_VISIBILITIES } from '../entities/study.ts';
import { PASSWORD_MIN_LENGTH } from './password.ts';

const email = z
  .string({ error: 'is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'must be an e-mail address' }).max(254, { error: 'must be at most 254 characters' }));

export const NewPassword = z
  .string({ error: 'is required' })
  .min(PASSWORD_MIN_LENGTH, { error: `must be at least ${PASSWORD_MIN_LENGTH} characters` })
  .max(200, { error: 'must be at most 200 characters' });

const personName = z
  .string({ error: 'is required' })
  .trim()
  .min(1, { error: 'is required' })
  .max(120, { error: 'must be at most 120 characters' });

const uuid = z.uuid({ error: 'must be an id' });

// The max keeps an absurd password from reaching argon2 (and the audit log) at all.
export const LoginBody = z
  .object({ email, password: z.string({ error: 'is required' }).min(1, { error: 'is required' }).max(200, { error: 'must be at most 200 characters' }) })
  .strict();
export const ResetRequestBody = z.object({ email }).strict();
export const ResetBody = z.object({ password: NewPassword }).strict();
export const TokenParams = z.object({ token: z.string().min(16, { error: 'is not a valid link' }).max(200) });

export const ProfileBody = z.object({ name: personName }).strict();
export const PasswordChangeBody = z
  .object({ currentPassword: z.string({ error: 'is required' }).min(1, { error: 'is required' }), newPassword: NewPassword })
  .strict();
export const ApiTokenBody = z.object({ name: personName }).strict();
export const TokenIdParams = z.object({ tokenId: uuid });

export const RoleBody = z.object({ role: z.enum(TEAM_ROLES, { error: `must be one of ${TEAM_ROLES.join(', ')}` }) }).strict();
export const UserIdParams = z.object({ userId: uuid });
export const InviteBody = z
  .object({ email, role: z.enum(TEAM_ROLES, { error: `must be one of ${TEAM_ROLES.join(', ')}` }) })
  .strict();
export const InvitationIdParams = z.object({ invitationId: uuid });
export const AcceptInviteBody = z.object({ name: personName, password: NewPassword }).strict();

export const MessageIdParams = z.object({ messageId: uuid });
export const StudyIdParams = z.object({ studyId: uuid });
export const SharesBody = z
  .object({
    visibility: z.enum(STUDY_VISIBILITIES, { error: `must be one of ${STUDY_VISIBILITIES.join(', ')}` }),
    shares: z
      .array(
        z.object({ userId: uuid, access: z.enum(SHARE_ACCESS, { error: `must be one of ${SHARE_ACCESS.join(', ')}` }) }).strict(),
      )
      .max(500),
  })
  .strict();
export type SharesInput = z.output<typeof SharesBody>;
