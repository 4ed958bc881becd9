/** The account feature's tables, registered in one place in entities/index.ts. */
import { ApiToken } from './api-token.ts';
import { AuditEvent } from './audit-event.ts';
import { Invitation } from './invitation.ts';
import { MailMessage } from './mail-message.ts';
import { PasswordReset } from './password-reset.ts';

export { ApiToken, AuditEvent, Invitation, MailMessage, PasswordReset };
export const accountEntities = [AuditEvent, Invitation, PasswordReset, ApiToken, MailMessage];
