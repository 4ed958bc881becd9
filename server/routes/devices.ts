/** Devices: the list and create under /api/studies/:id/devices, one device under /api/devices/:id. */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';
import { createDevice, deleteDevice, getDevice, listDevices, patchDevice, sweepDevice } from '../services/device-service.ts';
import { deviceSweepQueueFull } from '../devices/device-sweep-pool.ts';
import { ApiError } from '../errors.ts';
import { DeviceSweepRequestSchema, type DeviceSweepRequest } from '../../shared/devices/device-sweep.ts';
import { DeviceCreateSchema, DevicePatchSchema, type DeviceCreate, type DevicePatch } from '../../shared/schemas/device.ts';
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
    res.status(201).json(await createDevice(ctx, userOf(req), idOf(req), req.body as DeviceCreate));
  });
  return router;
}

export function devicesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/devices/:id', requireAuth, id, async (req, res) => {
    res.json(await getDevice(ctx, userOf(req), idOf(req)));
  });
  router.patch('/devices/:id', requireRole('engineer'), id, validate({ body: DevicePatchSchema }), async (req, res) => {
    res.json(await patchDevice(ctx, userOf(req), idOf(req), req.body as DevicePatch));
  });
  // Reading is enough: a sweep stores nothing, it answers the variants' coverage rows.
  router.post('/devices/:id/sweep', requireAuth, id, validate({ body: DeviceSweepRequestSchema }), async (req, res) => {
    if (deviceSweepQueueFull()) throw new ApiError(503, 'busy', 'sweep: too many device computations waiting; try again shortly');
    const abort = new AbortController();
    res.on('close', () => {
      if (!res.writableEnded) abort.abort();
    });
    try {
      res.json(await sweepDevice(ctx, userOf(req), idOf(req), req.body as DeviceSweepRequest, abort.signal));
    } catch (err) {
      if (!abort.signal.aborted) throw err;
    }
  });
  router.delete('/devices/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteDevice(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  return router;
}
