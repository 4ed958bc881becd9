/** The review packet: GET /api/studies/:id/packet (JSON for the printable page) and /packet.pdf (server-drawn PDF). */
import { Router, type Request } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { renderPacketPdf } from '../packet/render-pdf.ts';
import { buildPacket } from '../services/packet-service.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

/** The RF-exposure estimate's distance and reference level, as the reader set them in the app. */
const PacketQuerySchema = z.object({
  distanceM: z.coerce.number({ error: 'must be a number of metres greater than 0' }).positive('must be a number of metres greater than 0').max(1e5, 'must be at most 100000 m').optional(),
  referenceWm2: z.coerce.number({ error: 'must be a number of W/m² greater than 0' }).positive('must be a number of W/m² greater than 0').max(1e6, 'must be at most 1e6 W/m²').optional(),
});
const query = validate({ query: PacketQuerySchema });

/** File name safe in a Content-Disposition header. */
const fileName = (name: string) => `${name.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'study'}-review-packet.pdf`;

export function packetRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/packet', requireAuth, id, query, async (req, res) => {
    res.json(await buildPacket(ctx, userOf(req), idOf(req), parsed(req, 'query', PacketQuerySchema)));
  });
  router.get('/studies/:id/packet.pdf', requireAuth, id, query, async (req, res) => {
    const data = await buildPacket(ctx, userOf(req), idOf(req), parsed(req, 'query', PacketQuerySchema));
    const pdf = await renderPacketPdf(data);
    res.type('application/pdf').set('Content-Disposition', `inline; filename="${fileName(data.study.name)}"`).send(pdf);
  });
  return router;
}
