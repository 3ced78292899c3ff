// Prefixed console output for the operational scripts.
export function say(tag: string, message: string): void {
  console.log(`[${tag}] ${message}`);
}

export function fail(tag: string, message: string): never {
  console.error(`[${tag}] ${message}`);
  process.exit(1);
}
