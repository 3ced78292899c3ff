/**
 * The layout planner's version, saved with every stored plan so an old estimate can be traced
 * to the planner that drew it. Bump it whenever the same request can give a different plan
 * (a new search, other rounding, another packing rule); a stored plan whose version differs
 * from this one may no longer be reproduced exactly by planning its saved request again.
 */
export const LAYOUT_ENGINE_VERSION = 'layout-2026.12.1';
