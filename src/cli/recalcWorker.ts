/**
 * A worker thread of `potentia recalc` with several workbooks: recalculates the one workbook
 * it is given and posts back what it printed and its exit code.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { recalcForBatch } from './recalcCommand';
import type { RecalcOptions } from './recalcCommand';

const job = workerData as { input: string; output: string; options: RecalcOptions };
void recalcForBatch(job.input, job.output, job.options).then((r) => parentPort?.postMessage(r));
