/** Devices: the list and create under /api/studies/:id/devices, one device under /api/devices/:id, and sweeps over one. */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { createDevice, deleteDevice, getDevice, listDevices, patchDevice } from '../services/device-service.ts';
import { createDeviceSweep } from '../services/device-sweep-service.ts';
import { DeviceSweepRequestSchema } from '../../shared/devices/device-sweep.ts';
import { DeviceCreateSchema, DevicePatchSchema } from '../../shared/schemas/device.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

/** Mounted by the studies router; mergeParams brings the study's :id. */
export function studyDevicesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/devices', requireAuth, id, async (req, res) => {
    res.json(await listDevices(ctx, userOf(req), idOf(req)));
  });
  router.post('/studies/:id/devices', requireRole('engineer'), id, validate({ body: DeviceCreateSchema }), async (req, res) => {
    res.status(201).json(await createDevice(ctx, userOf(req), idOf(req), parsed(req, 'body', DeviceCreateSchema)));
  });
  return router;
}

export function devicesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/devices/:id', requireAuth, id, async (req, res) => {
    res.json(await getDevice(ctx, userOf(req), idOf(req)));
  });
  router.patch('/devices/:id', requireRole('engineer'), id, validate({ body: DevicePatchSchema }), async (req, res) => {
    res.json(await patchDevice(ctx, userOf(req), idOf(req), parsed(req, 'body', DevicePatchSchema)));
  });
  // A stored sweep in the device's study, run by the sweep runner like any sweep (progress, cancel, results: /api/sweeps/:id).
  router.post('/devices/:id/sweeps', requireRole('engineer'), id, validate({ body: DeviceSweepRequestSchema }), async (req, res) => {
    res.status(201).json(await createDeviceSweep(ctx, userOf(req), idOf(req), parsed(req, 'body', DeviceSweepRequestSchema)));
  });
  router.delete('/devices/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteDevice(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  return router;
}
