/** Output rounding: lengths and coordinates to 1/10000 ft, areas to 1/100 sq ft. */
export function roundFt(value: number): number {
  return Math.round(value * 1e4) / 1e4 + 0;
}

export function roundSqFt(value: number): number {
  return Math.round(value * 100) / 100 + 0;
}

export function roundPoint(point: readonly [number, number]): [number, number] {
  return [roundFt(point[0]), roundFt(point[1])];
}
