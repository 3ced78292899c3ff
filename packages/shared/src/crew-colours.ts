// The colours a company may give its crews. Our own picks, each dark enough that white event
// text on it reaches WCAG 2.2 AA (4.5:1); apps/web/src/crew-colours-contrast.test.ts measures
// every one with colord. The calendar always prints the crew's name too, so colour is never
// the only cue.
export const crewColours = [
  { key: 'pine', label: 'Pine', hex: '#1F6F4A' },
  { key: 'harbour', label: 'Harbour blue', hex: '#1F5F99' },
  { key: 'plum', label: 'Plum', hex: '#7A3E8E' },
  { key: 'brick', label: 'Brick', hex: '#A63A2B' },
  { key: 'lagoon', label: 'Lagoon', hex: '#0F6E6E' },
  { key: 'umber', label: 'Umber', hex: '#8A5A00' },
  { key: 'slate', label: 'Slate', hex: '#4A5568' },
  { key: 'berry', label: 'Berry', hex: '#A3325D' },
] as const;

export type CrewColour = (typeof crewColours)[number]['key'];
export const crewColourKeys = crewColours.map((c) => c.key) as [CrewColour, ...CrewColour[]];

export function crewColourHex(key: string): string {
  return crewColours.find((c) => c.key === key)?.hex ?? crewColours[0].hex;
}
