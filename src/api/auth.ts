/** Sign-in, sign-out, who am I, password reset and invitations. */
import type { InvitationInfo, Me } from '@shared/api/account.ts';
import { api } from './client';

const reset = (token: string) => `/api/auth/password-reset/${encodeURIComponent(token)}`;
const invitation = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;

export const authApi = {
  me: () => api.get<Me>('/api/me'),
  login: (email: string, password: string) => api.post<Me>('/api/auth/login', { email, password }),
  logout: () => api.post<void>('/api/auth/logout'),
  requestPasswordReset: (email: string) => api.post<{ message: string }>('/api/auth/password-reset', { email }),
  passwordResetEmail: (token: string) => api.get<{ email: string }>(reset(token)),
  resetPassword: (token: string, password: string) => api.post<void>(reset(token), { password }),
  invitation: (token: string) => api.get<InvitationInfo>(invitation(token)),
  acceptInvitation: (token: string, body: { name: string; password: string }) => api.post<Me>(`${invitation(token)}/accept`, body),
};

/** The session changed (sign-in, sign-out, invitation accepted): the next state-changing request fetches a new token. */
export { resetCsrfToken } from './client';
