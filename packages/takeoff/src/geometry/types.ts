/** A point in feet: `[x, y]`, x to the east, y to the north. */
export type Point = readonly [number, number];

/** A closed ring of points without the repeated closing point. Either winding. */
export type Ring = readonly Point[];
