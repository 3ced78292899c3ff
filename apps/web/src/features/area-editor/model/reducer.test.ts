import { describe, expect, it } from 'vitest';
import type { EditorAction } from './actions';
import { measure } from './measure';
import { editorReducer, initialEditorState } from './reducer';
import type { EditorState } from './types';

function run(actions: EditorAction[], state: EditorState = initialEditorState()): EditorState {
  return actions.reduce(editorReducer, state);
}

const noSnap = { gridFt: null, angles: false } as const;

describe('drawing by typing sides', () => {
  it('draws an L from typed sides and measures it', () => {
    // 40 ft east, 15 north, 20 west, 10 north, 20 west; the last side back south closes it.
    // Check value: 40 × 15 + 20 × 10 = 800 sq ft; perimeter 40+15+20+10+20+25 = 130 ft (arithmetic).
    const state = run([
      { type: 'appendSide', angleDeg: 0, lengthFt: 40 },
      { type: 'appendSide', angleDeg: 90, lengthFt: 15 },
      { type: 'appendSide', angleDeg: 180, lengthFt: 20 },
      { type: 'appendSide', angleDeg: 90, lengthFt: 10 },
      { type: 'appendSide', angleDeg: 180, lengthFt: 20 },
    ]);
    expect(state.doc.outer.points).toEqual([
      [0, 0],
      [40, 0],
      [40, 15],
      [20, 15],
      [20, 25],
      [0, 25],
    ]);
    expect(state.doc.outer.tags).toHaveLength(6);
    expect(measure(state.doc)).toMatchObject({ areaSqFt: 800, perimeterFt: 130 });
    // The first side (two points) is one undo step.
    expect(state.past).toHaveLength(5);
  });

  it('refuses a side of no length', () => {
    const state = run([{ type: 'appendSide', angleDeg: 0, lengthFt: 0 }]);
    expect(state.refusal).toEqual({ kind: 'zero-length' });
    expect(state.doc.outer.points).toEqual([]);
  });

  it('types a side length into a template and keeps it rectangular', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'setSideLength', index: 1, lengthFt: 27.5 },
    ]);
    expect(measure(state.doc).areaSqFt).toBe(30 * 27.5);
  });
});

describe('clicking and dragging', () => {
  it('adds clicked points snapped to the grid and squared up', () => {
    const state = run([
      { type: 'addPoint', point: [0.2, -0.1], toleranceFt: 0.5 },
      { type: 'addPoint', point: [20.1, 0.3], toleranceFt: 0.5 },
      { type: 'addPoint', point: [19.8, 14.7], toleranceFt: 0.5 },
    ]);
    expect(state.doc.outer.points).toEqual([
      [0, 0],
      [20, 0],
      [20, 14.5],
    ]);
    expect(state.selected).toBe(2);
  });

  it('inserts a clicked point after the selected one', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'select', line: { kind: 'outer' }, index: 0 },
      { type: 'setSnapping', snapping: noSnap },
      { type: 'addPoint', point: [15, -3], toleranceFt: 0 },
    ]);
    expect(state.doc.outer.points[1]).toEqual([15, -3]);
    expect(state.doc.outer.points).toHaveLength(5);
    expect(state.selected).toBe(1);
  });

  it('refuses a point that makes the outline cross itself, saying where', () => {
    const start = run([{ type: 'template', template: 'rectangle' }]);
    // Moving the north-east corner below the south side makes the east and north sides cross it.
    const state = run([{ type: 'movePoint', index: 2, point: [10, -10] }], start);
    expect(state.doc).toBe(start.doc);
    expect(state.refusal).toMatchObject({ kind: 'crossing', line: { kind: 'outer' } });
  });

  it('refuses a point on top of its neighbour', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'movePoint', index: 1, point: [0, 0] },
    ]);
    expect(state.refusal).toEqual({ kind: 'duplicate', line: { kind: 'outer' } });
  });

  it('makes a whole drag one undo step and keeps the last good spot', () => {
    const start = run([{ type: 'template', template: 'rectangle' }]);
    const dragged = run(
      [
        { type: 'dragStart', line: { kind: 'outer' }, index: 2 },
        { type: 'dragMove', point: [32.2, 21.1], toleranceFt: 0.1 },
        { type: 'dragMove', point: [35.2, 24.9], toleranceFt: 0.1 },
        { type: 'dragMove', point: [10, -10], toleranceFt: 0.1 }, // would cross: stays put
        { type: 'dragEnd' },
      ],
      start,
    );
    expect(dragged.doc.outer.points[2]).toEqual([35, 25]);
    expect(dragged.past).toHaveLength(start.past.length + 1);
    expect(editorReducer(dragged, { type: 'undo' }).doc).toBe(start.doc);
  });

  it('nudges the selected point by the step given', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'select', line: { kind: 'outer' }, index: 2 },
      { type: 'nudge', dx: 0.5, dy: 0 },
      { type: 'nudge', dx: 0, dy: -1 },
    ]);
    expect(state.doc.outer.points[2]).toEqual([30.5, 19]);
  });
});

describe('undo and redo', () => {
  it('steps back and forward, and a new edit clears what could be redone', () => {
    const a = run([{ type: 'template', template: 'rectangle' }]);
    const b = run([{ type: 'setSideLength', index: 0, lengthFt: 40 }], a);
    const undone = editorReducer(b, { type: 'undo' });
    expect(undone.doc).toBe(a.doc);
    expect(editorReducer(undone, { type: 'redo' }).doc).toBe(b.doc);
    const edited = editorReducer(undone, { type: 'setSideLength', index: 0, lengthFt: 35 });
    expect(edited.future).toEqual([]);
    expect(editorReducer(edited, { type: 'redo' })).toBe(edited);
  });

  it('moves the selection off a hole that undo took away', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'addHole', kind: 'planter', shape: 'template' },
      { type: 'undo' },
    ]);
    expect(state.doc.holes).toEqual([]);
    expect(state.active).toEqual({ kind: 'outer' });
  });
});

describe('templates, holes and walkways', () => {
  it('starts from an L and a 24-sided circle marked as tight curves', () => {
    const l = run([{ type: 'template', template: 'l-shape' }]);
    expect(measure(l.doc).areaSqFt).toBe(30 * 25 - 15 * 15);
    const circle = run([{ type: 'template', template: 'circle' }]);
    expect(circle.doc.outer.points).toHaveLength(24);
    expect(circle.doc.outer.curved.every(Boolean)).toBe(true);
    // A 24-gon inside a 6 ft circle: ½ · 24 · 36 · sin 15° ≈ 111.8 sq ft (geometry).
    expect(measure(circle.doc).areaSqFt).toBeCloseTo(111.8, 1);
  });

  it('puts a planter inside the outline, clear of the notch, and takes it off the area', () => {
    const state = run([
      { type: 'template', template: 'l-shape' },
      { type: 'addHole', kind: 'planter', shape: 'template' },
      { type: 'addHole', kind: 'tree', shape: 'template' },
    ]);
    expect(state.doc.holes).toHaveLength(2);
    expect(state.active).toEqual({ kind: 'hole', index: 1 });
    const m = measure(state.doc);
    expect(m.areaSqFt).toBeLessThan(525 - 9);
    expect(m.curvedFt).toBeGreaterThan(0);
  });

  it('draws a hole point by point, refusing one that crosses itself', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'setSnapping', snapping: noSnap },
      { type: 'addHole', kind: 'other', shape: 'empty' },
      { type: 'addPoint', point: [5, 5], toleranceFt: 0 },
      { type: 'addPoint', point: [10, 5], toleranceFt: 0 },
      { type: 'addPoint', point: [5, 10], toleranceFt: 0 },
      { type: 'addPoint', point: [10, 10], toleranceFt: 0 },
    ]);
    expect(state.doc.holes[0]?.points).toHaveLength(3);
    expect(state.refusal).toMatchObject({ kind: 'crossing', line: { kind: 'hole', index: 0 } });
  });

  it('draws a walkway as an open line with its width', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'addPath' },
      { type: 'addPoint', point: [0, 10], toleranceFt: 0.5 },
      { type: 'addPoint', point: [30, 10.2], toleranceFt: 0.5 },
      { type: 'setPathWidth', index: 0, widthFt: 4 },
    ]);
    expect(state.doc.paths).toEqual([
      {
        points: [
          [0, 10],
          [30, 10],
        ],
        widthFt: 4,
      },
    ]);
    const removed = editorReducer(state, { type: 'removeLine', line: { kind: 'path', index: 0 } });
    expect(removed.doc.paths).toEqual([]);
  });

  it('tags sides one by one or all at once, and marks curves', () => {
    const state = run([
      { type: 'template', template: 'rectangle' },
      { type: 'setAllTags', tag: 'lawn' },
      { type: 'setTag', line: { kind: 'outer' }, index: 2, tag: 'house' },
      { type: 'setCurved', line: { kind: 'outer' }, index: 1, curved: true },
    ]);
    expect(state.doc.outer.tags).toEqual(['lawn', 'lawn', 'house', 'lawn']);
    expect(measure(state.doc).curvedFt).toBe(20);
  });

  it('splits a side at its middle and deletes points', () => {
    const split = run([
      { type: 'template', template: 'rectangle' },
      { type: 'splitSide', index: 0 },
    ]);
    expect(split.doc.outer.points[1]).toEqual([15, 0]);
    expect(split.selected).toBe(1);
    const deleted = editorReducer(split, { type: 'deletePoint' });
    expect(deleted.doc.outer.points).toHaveLength(4);
  });
});
