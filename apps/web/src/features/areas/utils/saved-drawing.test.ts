import { describe, expect, it } from 'vitest';
import { drawingRings, readSavedDrawing } from './saved-drawing';

describe('readSavedDrawing', () => {
  it('reads the saved planner request back as a drawing, walkway widths filled in', () => {
    const drawing = readSavedDrawing({
      area: {
        outer: [
          [0, 0],
          [40, 0],
          [40, 18],
          [25, 18],
          [25, 30],
          [0, 30],
        ],
      },
      roll: { widthFt: 15 },
      edges: ['hard', null, null, null, 'house', null],
      trafficPaths: [
        [
          [2, 25],
          [38, 2],
        ],
      ],
    });
    expect(drawing?.area.holes).toEqual([]);
    expect(drawing?.edges).toEqual(['hard', null, null, null, 'house', null]);
    // A plain polyline walkway is 3 ft wide (the planner's DEFAULT_WALKWAY_WIDTH_FT).
    expect(drawing?.trafficPaths).toEqual([
      {
        points: [
          [2, 25],
          [38, 2],
        ],
        widthFt: 3,
      },
    ]);
    expect(drawing ? drawingRings(drawing) : null).toHaveLength(1);
  });

  it('gives null for a request that does not read', () => {
    expect(readSavedDrawing({ area: { outer: [[0, 0]] } })).toBeNull();
    expect(readSavedDrawing(null)).toBeNull();
  });
});
