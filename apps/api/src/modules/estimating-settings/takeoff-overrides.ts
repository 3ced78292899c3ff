// Takeoff overrides: the company stores only what differs from the standard defaults; the
// effective settings are the defaults with the overrides laid over them (arrays replace).
import {
  defaultTakeoffSettings,
  takeoffSettingSource,
  takeoffSettingsSchema,
  type TakeoffSettings,
} from '@seamwright/takeoff';
import type { FieldError, TakeoffOverrides, TakeoffSettingView } from '@seamwright/shared';

type Json = TakeoffOverrides[string];
type JsonObject = { [key: string]: Json };

const isObject = (value: unknown): value is JsonObject =>
  value !== null && typeof value === 'object' && !Array.isArray(value);

/** Lays `patch` over `base`; a `null` in the patch removes that key. */
export function mergeOverrides(base: JsonObject, patch: JsonObject): JsonObject {
  const result: JsonObject = { ...base };
  for (const [key, value] of Object.entries(patch)) {
    if (value === null) delete result[key];
    else if (isObject(value)) {
      const current = result[key];
      const merged = mergeOverrides(isObject(current) ? current : {}, value);
      if (Object.keys(merged).length > 0) result[key] = merged;
      else delete result[key];
    } else result[key] = value;
  }
  return result;
}

/** Paths in `overrides` that are not settings at all (typos, removed settings). */
export function unknownOverridePaths(
  overrides: JsonObject,
  standard: unknown,
  prefix = '',
): string[] {
  return Object.entries(overrides).flatMap(([key, value]) => {
    const path = prefix ? `${prefix}.${key}` : key;
    if (!isObject(standard) || !(key in standard)) return [path];
    const child = standard[key];
    return isObject(value) && isObject(child) ? unknownOverridePaths(value, child, path) : [];
  });
}

/** Drops overrides equal to the standard, so "reset" and "typed the standard" look the same. */
export function pruneOverrides(overrides: JsonObject, standard: unknown): JsonObject {
  const result: JsonObject = {};
  for (const [key, value] of Object.entries(overrides)) {
    const child = isObject(standard) ? standard[key] : undefined;
    if (isObject(value) && isObject(child)) {
      const pruned = pruneOverrides(value, child);
      if (Object.keys(pruned).length > 0) result[key] = pruned;
    } else if (JSON.stringify(value) !== JSON.stringify(child)) result[key] = value;
  }
  return result;
}

const standardJson = defaultTakeoffSettings as unknown as JsonObject;

/** The effective settings, or the field errors (paths prefixed `takeoff.`). */
export function effectiveTakeoffSettings(
  overrides: TakeoffOverrides,
): { settings: TakeoffSettings; errors: [] } | { settings: null; errors: FieldError[] } {
  const unknown = unknownOverridePaths(overrides, standardJson);
  if (unknown.length > 0)
    return {
      settings: null,
      errors: unknown.map((path) => ({
        path: `takeoff.${path}`,
        message: 'Not a takeoff setting',
      })),
    };
  const parsed = takeoffSettingsSchema.safeParse(mergeOverrides(standardJson, overrides));
  if (parsed.success) return { settings: parsed.data, errors: [] };
  return {
    settings: null,
    errors: parsed.error.issues.map((issue) => ({
      path: ['takeoff', ...issue.path.map(String)].join('.'),
      message: issue.message,
    })),
  };
}

function leafPaths(value: unknown, prefix: string): string[] {
  if (!isObject(value)) return [prefix];
  return Object.entries(value).flatMap(([key, child]) =>
    leafPaths(child, prefix ? `${prefix}.${key}` : key),
  );
}

function valueAt(root: unknown, path: string): unknown {
  return path
    .split('.')
    .reduce<unknown>((node, key) => (isObject(node) ? node[key] : undefined), root);
}

/** Every setting with its value, the standard and where the standard comes from. */
export function takeoffSettingViews(
  settings: TakeoffSettings,
  overrides: TakeoffOverrides,
): TakeoffSettingView[] {
  return leafPaths(standardJson, '').map((path) => ({
    path,
    value: valueAt(settings, path),
    standard: valueAt(standardJson, path),
    source: takeoffSettingSource(path) ?? 'Seamwright default',
    isOverridden: valueAt(overrides, path) !== undefined,
  }));
}
