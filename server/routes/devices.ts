/** Devices: the list and create under /api/studies/:id/devices, one device under /api/devices/:id. */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';
import { createDevice, deleteDevice, getDevice, listDevices, patchDevice } from '../services/device-service.ts';
import { DeviceCreateSchema, DevicePatchSchema, type DeviceCreate, type DevicePatch } from '../../shared/schemas/device.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

/** Mounted by the studies router; mergeParams brings the study's :id. */
export function studyDevicesRouter(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });
  router.get('/', requireAuth, id, async (req, res) => {
    res.json(await listDevices(ctx, req.user!, idOf(req)));
  });
  router.post('/', requireRole('engineer'), id, validate({ body: DeviceCreateSchema }), async (req, res) => {
    res.status(201).json(await createDevice(ctx, req.user!, idOf(req), req.body as DeviceCreate));
  });
  return router;
}

export function devicesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/:id', requireAuth, id, async (req, res) => {
    res.json(await getDevice(ctx, req.user!, idOf(req)));
  });
  router.patch('/:id', requireRole('engineer'), id, validate({ body: DevicePatchSchema }), async (req, res) => {
    res.json(await patchDevice(ctx, req.user!, idOf(req), req.body as DevicePatch));
  });
  router.delete('/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteDevice(ctx, req.user!, idOf(req));
    res.status(204).end();
  });
  return router;
}
