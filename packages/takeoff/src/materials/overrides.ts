import type { TakeoffLine } from './takeoff-line.js';

/** A quantity a person typed for one line, by the line's key. */
export interface TakeoffOverride {
  key: string;
  quantity: number;
  note?: string;
}

/**
 * Puts people's quantities over the computed ones. The line's `quantity` becomes the typed
 * value; `override.computedQuantity` keeps what the rule gave, and the rule stays as it was,
 * so the estimate shows both. Overrides for keys not in the takeoff are ignored (see
 * {@link unmatchedOverrides}). A negative or non-finite quantity throws a RangeError.
 */
export function applyOverrides(
  lines: readonly TakeoffLine[],
  overrides: readonly TakeoffOverride[],
): TakeoffLine[] {
  const byKey = new Map<string, TakeoffOverride>();
  for (const override of overrides) {
    if (!Number.isFinite(override.quantity) || override.quantity < 0) {
      throw new RangeError(`Override for ${override.key} must be a number of 0 or more`);
    }
    byKey.set(override.key, override);
  }
  return lines.map((line) => {
    const override = byKey.get(line.key);
    if (!override) return line;
    const computedQuantity = line.override?.computedQuantity ?? line.quantity;
    return {
      ...line,
      quantity: override.quantity,
      override: {
        quantity: override.quantity,
        computedQuantity,
        ...(override.note === undefined ? {} : { note: override.note }),
      },
    };
  });
}

/** Overrides whose key matches no line (e.g. a line that no longer applies after a plan change). */
export function unmatchedOverrides(
  lines: readonly TakeoffLine[],
  overrides: readonly TakeoffOverride[],
): TakeoffOverride[] {
  const keys = new Set(lines.map((line) => line.key));
  return overrides.filter((override) => !keys.has(override.key));
}
