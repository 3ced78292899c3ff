/**
 * plan-job — reads a job request (JSON: several areas, rolls, optional remnants and costs)
 * on standard input and writes the job plan (JSON) on standard output. Bad input (invalid
 * JSON, a bad field) exits 1 with one line on standard error naming the field. Usage:
 * `pnpm --silent plan-job < job.json`. Safe anywhere: no I/O beyond the two streams.
 */
import { parseJobRequest, planJob } from '../index.js';
import { runJsonCommand } from './run-json-command.js';

void runJsonCommand('plan-job', (json) => planJob(parseJobRequest(json)));
