import { describe, expect, it } from 'vitest';
import { fitView, gridStepFor, panView, zoomView } from './view';

describe('the drawing view', () => {
  it('fits a shape with a margin, by its wider side for the aspect', () => {
    expect(
      fitView(
        [
          [0, 0],
          [30, 0],
          [30, 20],
          [0, 20],
        ],
        0.5,
      ),
    ).toEqual({ cx: 15, cy: 10, widthFt: 52 });
  });

  it('zooms about a point and keeps that point in place', () => {
    const view = { cx: 10, cy: 10, widthFt: 40 };
    const zoomed = zoomView(view, 2, [0, 0]);
    expect(zoomed).toEqual({ cx: 5, cy: 5, widthFt: 20 });
    expect(zoomView(view, 1000).widthFt).toBe(4);
  });

  it('pans and picks a readable grid', () => {
    expect(panView({ cx: 0, cy: 0, widthFt: 10 }, 2, -1)).toEqual({ cx: 2, cy: -1, widthFt: 10 });
    expect(gridStepFor({ cx: 0, cy: 0, widthFt: 30 }, 0.5)).toBe(0.5);
    expect(gridStepFor({ cx: 0, cy: 0, widthFt: 300 }, 0.5)).toBe(5);
  });
});
