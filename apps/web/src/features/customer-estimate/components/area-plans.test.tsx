import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import type { PublicEstimateArea } from '@seamwright/shared';
import { areaDrawingOf } from '../utils/area-drawing';
import { AreaPlans } from './area-plans';

// A 30 × 20 ft rectangle (600 sq ft, arithmetic) with an empty plan: enough to draw the outline.
const area: PublicEstimateArea = {
  name: 'Back lawn',
  areaSqFt: 600,
  outline: {
    outer: [
      [0, 0],
      [30, 0],
      [30, 20],
      [0, 20],
    ],
    holes: [],
  },
  trafficPaths: [],
  plan: { grainAngleDeg: 90, pieces: [], cuts: [], seamLines: [], orderedSqFt: 600 },
};

describe('the plan on the customer page', () => {
  it('draws in the company units without a session', () => {
    render(<AreaPlans areas={[area]} units="metric" />);
    const drawing = screen.getByRole('img', { name: /Plan of Back lawn/ });
    expect(drawing.textContent).toMatch(/m²/);
    expect(screen.getByText(/Back lawn: .*m²/)).toBeTruthy();
  });

  it('shows only the size when the saved plan lacks what the drawing needs', () => {
    expect(areaDrawingOf({ ...area, plan: { grainAngleDeg: 90 } })).toBeNull();
    expect(areaDrawingOf({ ...area, outline: null })).toBeNull();
    expect(areaDrawingOf(area)?.rings).toHaveLength(1);
  });
});
