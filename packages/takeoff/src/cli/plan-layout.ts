/**
 * plan-layout — reads a layout request (JSON) on standard input and writes the plan (JSON)
 * on standard output. Bad input (invalid JSON or geometry) exits 1 with one line on
 * standard error. Usage: `pnpm --silent plan-layout < request.json`. Safe anywhere: no I/O
 * beyond the two streams.
 */
import { parseLayoutRequest, planLayout } from '../index.js';
import { runJsonCommand } from './run-json-command.js';

void runJsonCommand('plan-layout', (json) => planLayout(parseLayoutRequest(json)));
