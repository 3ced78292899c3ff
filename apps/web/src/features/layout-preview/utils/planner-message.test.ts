import { describe, expect, it } from 'vitest';
import { LayoutInputError } from '@seamwright/takeoff';
import { plannerMessage } from './planner-message';

describe('plannerMessage', () => {
  it('names the field as the person typed it, including the work limits', () => {
    const cases: [LayoutInputError, string][] = [
      [
        new LayoutInputError('area.outer', 'needs at least 3 points'),
        'The outline needs at least 3 points',
      ],
      [new LayoutInputError('area.holes[1]', 'crosses itself'), 'Hole 2: crosses itself'],
      [
        new LayoutInputError(
          'area',
          'must have at most 5000 points across the outer ring and holes (it has 12900)',
        ),
        'The yard must have at most 5000 points across the outer ring and holes (it has 12900)',
      ],
      [
        new LayoutInputError('area.holes', 'must have at most 50 holes (it has 60)'),
        'The holes must have at most 50 holes (it has 60)',
      ],
      [
        new LayoutInputError('trafficPaths', 'must have at most 20 paths (it has 21)'),
        'The walkways must have at most 20 paths (it has 21)',
      ],
      [
        new LayoutInputError('lengthStepFt', 'must be at least 1 in (1/12 ft)'),
        'The length step must be at least 1 in (1/12 ft)',
      ],
    ];
    for (const [error, sentence] of cases) expect(plannerMessage(error)).toBe(sentence);
  });
});
