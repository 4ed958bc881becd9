/**
 * The thread pool for coverage requests: the event loop validates and sends, the engine runs here, on a pool of
 * its own (see on-demand-pool.ts).
 */
import { fileURLToPath } from 'node:url';
import type { CoverageResult } from '../../shared/coverage/index.ts';
import type { CoverageInput } from '../../shared/schemas/coverage.ts';
import { onDemandPool } from '../compute/on-demand-pool.ts';

/** Requests waiting for a thread beyond this are refused (503) rather than queued without end. */
const MAX_QUEUE = 32;
const pool = onDemandPool<CoverageInput, CoverageResult>(fileURLToPath(new URL('../../workers/coverage.ts', import.meta.url)), MAX_QUEUE);

/** Whether the pool is refusing work (its queue is full). */
export const coverageQueueFull = (): boolean => pool.queued() >= MAX_QUEUE;

/** One coverage computation on a thread; aborting `signal` (the client went away) drops or stops it. */
export const runCoverageTask = (input: CoverageInput, signal?: AbortSignal): Promise<CoverageResult> => pool.run(input, signal);

/** Stops the threads (server shutdown, test teardown). */
export const destroyCoveragePool = (): Promise<void> => pool.destroy();
