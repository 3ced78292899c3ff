import { formatNumber } from '@seamwright/takeoff';

/** How a grain direction reads on site: "north–south" for 90°, "east–west" for 0°, else degrees. */
export function grainWords(angleDeg: number): string {
  const folded = ((angleDeg % 180) + 180) % 180; // a grain line reads the same both ways
  if (folded < 0.05 || folded > 179.95) return 'east–west';
  if (Math.abs(folded - 90) < 0.05) return 'north–south';
  return `${formatNumber(folded, 1)}° from east`;
}
