/**
 * plan-job — reads a job request (JSON: several areas, rolls, optional remnants and costs)
 * on standard input and writes the job plan (JSON) on standard output. Bad input (invalid
 * JSON, a bad field) exits 1 with one line on standard error naming the field. Usage:
 * `pnpm --silent plan-job < job.json`. Safe anywhere: no I/O beyond the two streams.
 */
import { LayoutInputError, parseJobRequest, planJob } from '../index.js';

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin)
    chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : (chunk as Buffer));
  return Buffer.concat(chunks).toString('utf8');
}

function fail(message: string): never {
  process.stderr.write(`${message.replace(/\s+/g, ' ').trim()}\n`);
  process.exit(1);
}

async function main(): Promise<void> {
  const text = await readStdin();
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    fail(
      `invalid JSON on standard input: ${error instanceof Error ? error.message : String(error)}`,
    );
  }
  try {
    const plan = planJob(parseJobRequest(json));
    process.stdout.write(`${JSON.stringify(plan, null, 2)}\n`);
  } catch (error) {
    if (error instanceof LayoutInputError) fail(error.message);
    fail(`plan-job failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}

void main();
