const WORDS = [
  'east',
  'north-east',
  'north',
  'north-west',
  'west',
  'south-west',
  'south',
  'south-east',
];
const LETTERS = ['E', 'NE', 'N', 'NW', 'W', 'SW', 'S', 'SE'];

function octant(angleDeg: number): number {
  return ((Math.round(angleDeg / 45) % 8) + 8) % 8;
}

/** Eight-point compass word for a direction given in degrees CCW from east ("north-west"). */
export function compassWord(angleDeg: number): string {
  return WORDS[octant(angleDeg)] as string;
}

/** Eight-point compass letters for a direction given in degrees CCW from east ("NW"). */
export function compassLetters(angleDeg: number): string {
  return LETTERS[octant(angleDeg)] as string;
}

/** Compass bearing (clockwise from north, 0–360) of a direction given CCW from east. */
export function bearingOf(angleDeg: number): number {
  const bearing = (((90 - angleDeg) % 360) + 360) % 360;
  return bearing === 360 ? 0 : bearing;
}
