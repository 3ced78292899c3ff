/**
 * plan-layout — reads a layout request (JSON) on standard input and writes the plan (JSON)
 * on standard output. Bad input (invalid JSON or geometry) exits 1 with one line on
 * standard error. Usage: `pnpm --silent plan-layout < request.json`. Safe anywhere: no I/O
 * beyond the two streams.
 */
import { LayoutInputError, parseLayoutRequest, planLayout } from '../index.js';

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
    const plan = planLayout(parseLayoutRequest(json));
    process.stdout.write(`${JSON.stringify(plan, null, 2)}\n`);
  } catch (error) {
    if (error instanceof LayoutInputError) fail(error.message);
    fail(`plan-layout failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}

void main();
