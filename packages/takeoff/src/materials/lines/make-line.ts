import type { TakeoffLine } from '../takeoff-line.js';

/** Builds a line; warnings default to none. */
export function makeLine(
  line: Omit<TakeoffLine, 'warnings' | 'override'> & { warnings?: string[] },
): TakeoffLine {
  return { ...line, warnings: line.warnings ?? [] };
}
