import { LayoutInputError } from '@seamwright/takeoff';

// The planner names fields by their request path; the screen names them as the person typed them.
const fieldNames: Array<[RegExp, string]> = [
  [/^area\.outer\b/, 'The outline'],
  [/^area\.holes\[(\d+)\]/, 'Hole'],
  [/^area\.holes\b/, 'The holes'],
  // The work limits name the whole area or the list of walkways (packages/takeoff limits.ts).
  [/^area\b/, 'The yard'],
  [/^trafficPaths\[0\](\.points)?/, 'The walkway'],
  [/^trafficPaths\b/, 'The walkways'],
  [/^lengthStepFt\b/, 'The length step'],
  [/^roll\.maxLengthFt/, 'The longest piece'],
  [/^roll\.widthFt/, 'The roll width'],
  [/^grain\.angleDeg/, 'The grain angle'],
];

/** A planner error as a sentence for the alert region. */
export function plannerMessage(error: unknown): string {
  if (!(error instanceof LayoutInputError))
    return 'The planner could not lay out this shape. Check the outline and try again.';
  for (const [pattern, name] of fieldNames) {
    const match = pattern.exec(error.message);
    if (match) {
      const label =
        match[1] !== undefined && name === 'Hole' ? `Hole ${Number(match[1]) + 1}` : name;
      return `${label}${error.message.slice(match[0].length)}`;
    }
  }
  return error.message;
}
