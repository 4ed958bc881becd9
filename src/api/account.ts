/** The signed-in member's own account: name, password and API tokens. */
import type { ApiTokenRow, Me } from '@shared/api/account.ts';
import { api } from './client';

export const accountApi = {
  saveProfile: (name: string) => api.patch<Me>('/api/account', { name }),
  changePassword: (currentPassword: string, newPassword: string) => api.put<void>('/api/account/password', { currentPassword, newPassword }),
  tokens: () => api.get<ApiTokenRow[]>('/api/account/tokens'),
  createToken: (name: string) => api.post<ApiTokenRow & { token: string }>('/api/account/tokens', { name }),
  deleteToken: (id: string) => api.delete<void>(`/api/account/tokens/${encodeURIComponent(id)}`),
};
