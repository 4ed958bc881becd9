/** Shared set-up for the review tests: a study made through the API and a small design to decide on. */
import type { AuthedClient } from '../helpers/auth.ts';

/** An invented 28 GHz edge module: 8 × 1 elements at 5.35 mm, 10 dBm per channel. */
export const EDGE_MODULE = {
  frequencyGHz: 28,
  nx: 8,
  ny: 1,
  dxMm: 5.35,
  taperX: { kind: 'taylor', sllDb: 25, nbar: 4 },
  element: { kind: 'cosine', q: 1.2 },
  channelPowerDbm: 10,
} as const;

export async function createStudy(engineer: AuthedClient, name = 'Harbor Point edge module'): Promise<string> {
  const res = await engineer.post('/api/studies').send({ name, description: '' });
  if (res.status !== 201) throw new Error(`POST /api/studies answered ${res.status}: ${JSON.stringify(res.body)}`);
  return (res.body as { id: string }).id;
}
