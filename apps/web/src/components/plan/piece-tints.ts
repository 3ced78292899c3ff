/**
 * Tints for the roll pieces, drawn from the theme: light enough for ink labels on top
 * (contrast above 7:1 with text-ink) and different in hue so neighbours tell apart. Pieces past
 * the last tint reuse the list; every cut is also labelled with its piece number, so colour is
 * never the only cue.
 */
const tints = [
  { fill: 'fill-moss-200', swatch: 'bg-moss-200' },
  { fill: 'fill-sand-300', swatch: 'bg-sand-300' },
  { fill: 'fill-sky-200', swatch: 'bg-sky-200' },
  { fill: 'fill-rose-200', swatch: 'bg-rose-200' },
  { fill: 'fill-violet-200', swatch: 'bg-violet-200' },
  { fill: 'fill-amber-200', swatch: 'bg-amber-200' },
  { fill: 'fill-teal-200', swatch: 'bg-teal-200' },
  { fill: 'fill-stone-300', swatch: 'bg-stone-300' },
] as const;

export function pieceTint(piece: number): (typeof tints)[number] {
  return tints[piece % tints.length] ?? tints[0];
}
