import type { AreaGrainChoice, CompassSide } from '@seamwright/shared';

const sideWords: Record<CompassSide, string> = {
  N: 'north',
  NE: 'north-east',
  E: 'east',
  SE: 'south-east',
  S: 'south',
  SW: 'south-west',
  W: 'west',
  NW: 'north-west',
};

/** How the grain was chosen, in words: "Blades toward the street (south), may turn 15°". */
export function grainChoiceWords(choice: AreaGrainChoice): string {
  if (choice.kind === 'cheapest') return 'Chosen for you: the way that buys the least turf';
  if (choice.kind === 'angle') return `As you set it: ${choice.angleDeg}° from east`;
  const side = sideWords[choice.facing];
  const target = choice.toward ? `the ${choice.toward} (${side})` : `the ${side}`;
  const turn = choice.toleranceDeg > 0 ? `, turned up to ${choice.toleranceDeg}° to save turf` : '';
  return `Blades lean toward ${target}${turn}`;
}
