/** The review packet as data (the printable page draws it; the PDF route renders the same on the server). */
import type { Packet } from '@shared/api/packet.ts';
import { api } from './client';

export const packetApi = {
  /** `query` is the packet page's own query string (decision, sweep), passed through as is. */
  get: (studyId: string, query: string) => api.get<Packet>(`/api/studies/${encodeURIComponent(studyId)}/packet${query ? `?${query}` : ''}`),
};
