// Layout requests that cost the planner a lot, for the planner-pool tests.
import { irregularYard } from '@seamwright/takeoff';

function circle(cx: number, cy: number, radius: number, sides: number): [number, number][] {
  return Array.from({ length: sides }, (_, i): [number, number] => {
    const t = (2 * Math.PI * i) / sides;
    return [
      Math.round((cx + radius * Math.cos(t)) * 1000) / 1000,
      Math.round((cy + radius * Math.sin(t)) * 1000) / 1000,
    ];
  });
}

/**
 * The request from the incident: a 4,900-point outer ring, 40 holes of 200 points (a grid of
 * round planters well inside it) and a 0.01 ft length step — 12,900 points in all.
 */
export function incidentRequest() {
  const holes = Array.from({ length: 40 }, (_, i) =>
    circle(-65 + (i % 8) * 30, -25 + Math.floor(i / 8) * 30, 8, 200),
  );
  return {
    area: { outer: irregularYard(4900, 7, 180, 200), holes },
    roll: { widthFt: 15, maxLengthFt: 100 },
    lengthStepFt: 0.01,
  };
}

/**
 * Inside every limit but still far more work than any budget allows (over a minute on the
 * development machine): the largest ring allowed, a 1 ft roll (about 400 strips) and the
 * direction left to the planner, so ~200 directions × ~40 offsets each scan 5,000 points.
 */
export function worstCaseWithinLimits() {
  return {
    area: { outer: irregularYard(5000, 5, 180, 200), holes: [] },
    roll: { widthFt: 1, maxLengthFt: 100 },
    lengthStepFt: 1 / 12,
  };
}
