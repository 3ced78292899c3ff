// Every crew colour carries white event text on the calendar, so each must reach 4.5:1 against
// white (WCAG 2.2 AA, 1.4.3), measured with colord (an outside implementation of the WCAG
// relative-luminance formula, not our own arithmetic).
import { colord, extend } from 'colord';
import a11yPlugin from 'colord/plugins/a11y';
import { describe, expect, it } from 'vitest';
import { crewColours } from '@seamwright/shared';

extend([a11yPlugin]);

describe('crew colours', () => {
  it.each(crewColours.map((c) => [c.label, c.hex] as const))(
    '%s (%s) reaches 4.5:1 with white text',
    (_label, hex) => {
      expect(colord(hex).contrast('#ffffff')).toBeGreaterThanOrEqual(4.5);
    },
  );

  it('has eight distinct colours with distinct names', () => {
    expect(new Set(crewColours.map((c) => c.hex.toLowerCase())).size).toBe(8);
    expect(new Set(crewColours.map((c) => c.label)).size).toBe(8);
  });
});
