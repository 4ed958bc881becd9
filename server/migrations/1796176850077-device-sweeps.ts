import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Sweeps over a device: `sweeps.device` holds what the worker threads need (the device's layout with the varied
 * module, the resolved designs, the variations and the sheet judging it, frozen when the sweep starts); such a sweep
 * has no grid, so `grid` becomes nullable. Its design rows carry the coverage figures beside the stored peak EIRP.
 * A device sweep holds at most 48 designs, so the new columns need no sort indexes (the sweep_id index reads them all).
 */
export class DeviceSweeps1796176850077 implements MigrationInterface {
  name = 'DeviceSweeps1796176850077';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE sweeps ADD COLUMN device jsonb, ALTER COLUMN grid DROP NOT NULL`);
    await q.query(`ALTER TABLE sweeps ADD CONSTRAINT sweeps_grid_or_device CHECK ((grid IS NULL) <> (device IS NULL))`);
    await q.query(`ALTER TABLE sweep_designs ADD COLUMN p50_eirp_dbm double precision, ADD COLUMN sector_min_eirp_dbm double precision, ADD COLUMN beams integer`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE sweep_designs DROP COLUMN beams, DROP COLUMN sector_min_eirp_dbm, DROP COLUMN p50_eirp_dbm`);
    // Device sweeps cannot exist without the column that describes them (their points and designs go with them).
    await q.query(`DELETE FROM sweeps WHERE device IS NOT NULL`);
    await q.query(`ALTER TABLE sweeps DROP CONSTRAINT sweeps_grid_or_device`);
    await q.query(`ALTER TABLE sweeps DROP COLUMN device, ALTER COLUMN grid SET NOT NULL`);
  }
}
