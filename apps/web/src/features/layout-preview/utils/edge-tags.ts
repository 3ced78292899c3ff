import type { EdgeTag } from '@seamwright/takeoff';

/** What an edge can meet on this screen: the planner's tags, or "Not sure" (sent as no tag). */
export const edgeChoices = [
  'hard',
  'bed',
  'lawn',
  'fence',
  'house',
  'unknown',
] as const satisfies readonly (EdgeTag | 'unknown')[];
export type EdgeChoice = (typeof edgeChoices)[number];

/** The words a select shows for each choice, in the order it lists them. */
export const edgeChoiceLabels: Record<EdgeChoice, string> = {
  hard: 'Hard surface (patio, path, drive)',
  bed: 'Planting bed',
  lawn: 'Lawn',
  fence: 'Fence or wall',
  house: 'House',
  unknown: 'Not sure',
};

/** An edge the screen names, and which edge of the built outer ring it is (edge i runs from point i to i + 1). */
export interface NamedEdge {
  readonly label: string;
  readonly ringEdge: number;
}

/**
 * The planner's `edges` list for an outer ring of `ringLength` edges: each named edge's choice
 * put at its ring position, "Not sure" as null. Undefined when nothing is tagged, so an
 * untagged yard sends the same request as before.
 */
export function tagsInRingOrder(
  named: readonly NamedEdge[],
  choices: readonly EdgeChoice[],
  ringLength: number,
): (EdgeTag | null)[] | undefined {
  const tags = new Array<EdgeTag | null>(ringLength).fill(null);
  named.forEach(({ ringEdge }, i) => {
    const choice = choices[i] ?? 'unknown';
    if (choice !== 'unknown') tags[ringEdge] = choice;
  });
  return tags.some((tag) => tag !== null) ? tags : undefined;
}

/** The same choice for every edge of an outer ring (the points shape's "All edges meet"). */
export function sameTagForAll(
  choice: EdgeChoice,
  ringLength: number,
): (EdgeTag | null)[] | undefined {
  return choice === 'unknown' ? undefined : new Array<EdgeTag>(ringLength).fill(choice);
}
