/**
 * The body both planner commands share: read JSON on standard input, compute, write JSON on
 * standard output; bad input (invalid JSON or a bad field) exits 1 with one line on standard
 * error naming the field.
 */
import { LayoutInputError } from '../index.js';

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

/** Runs `compute` on the parsed standard input; `name` prefixes unexpected failures. */
export async function runJsonCommand(name: string, compute: (json: unknown) => unknown) {
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
    process.stdout.write(`${JSON.stringify(compute(json), null, 2)}\n`);
  } catch (error) {
    if (error instanceof LayoutInputError) fail(error.message);
    fail(`${name} failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}
