/** A crossing seen from the band left of its boundary (just before the boundary). */
export const MINUS = 0;
/** A crossing seen from the band right of its boundary (just after the boundary). */
export const PLUS = 1;

/**
 * Parts narrower or shorter than this (feet) are hair-thin slivers between a strip edge and a
 * yard edge that nobody would cut turf for; both the fast scan and the final clipping drop them.
 */
export const SLIVER_FT = 1e-4;
