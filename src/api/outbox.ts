/** Mail the signed-in member may read in the local outbox. */
import type { MailDetail, MailRow } from '@shared/api/account.ts';
import { api } from './client';

export const outboxApi = {
  list: () => api.get<MailRow[]>('/api/outbox'),
  message: (id: string) => api.get<MailDetail>(`/api/outbox/${encodeURIComponent(id)}`),
};
