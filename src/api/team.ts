/** The team: members, roles and invitations. */
import type { PendingInvitation, TeamResponse, TeamRole } from '@shared/api/account.ts';
import { api } from './client';

export const teamApi = {
  team: () => api.get<TeamResponse>('/api/team'),
  invitations: () => api.get<PendingInvitation[]>('/api/team/invitations'),
  invite: (email: string, role: TeamRole) => api.post<void>('/api/team/invitations', { email, role }),
  setRole: (memberId: string, role: TeamRole) => api.patch<void>(`/api/team/members/${encodeURIComponent(memberId)}`, { role }),
  removeMember: (memberId: string) => api.delete<void>(`/api/team/members/${encodeURIComponent(memberId)}`),
  revokeInvitation: (id: string) => api.delete<void>(`/api/team/invitations/${encodeURIComponent(id)}`),
};
