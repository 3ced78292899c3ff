import { describe, expect, it } from 'vitest';
import { grainChoiceWords } from './area-words';

describe('grainChoiceWords', () => {
  it('says how the grain was chosen', () => {
    expect(grainChoiceWords({ kind: 'cheapest' })).toMatch(/least turf/);
    expect(grainChoiceWords({ kind: 'angle', angleDeg: 90 })).toBe('As you set it: 90° from east');
    expect(
      grainChoiceWords({ kind: 'facing', facing: 'S', toleranceDeg: 15, toward: 'street' }),
    ).toBe('Blades lean toward the street (south), turned up to 15° to save turf');
    expect(grainChoiceWords({ kind: 'facing', facing: 'NE', toleranceDeg: 0, toward: null })).toBe(
      'Blades lean toward the north-east',
    );
  });
});
