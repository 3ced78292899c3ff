import Flatten from '@flatten-js/core';
import { describe, expect, it } from 'vitest';
import { planLayout } from './plan-layout.js';
import { sampleYards } from './sample-yards.js';

// Independent reference: @flatten-js/core computes area and perimeter of the same faces.
describe('area and perimeter against @flatten-js/core', () => {
  for (const yard of sampleYards()) {
    it(yard.name, () => {
      const polygon = new Flatten.Polygon();
      polygon.addFace(yard.outer.map(([x, y]) => new Flatten.Point(x, y)));
      for (const hole of yard.holes) polygon.addFace(hole.map(([x, y]) => new Flatten.Point(x, y)));
      const faces = [...(polygon.faces as Iterable<Flatten.Face>)];
      const outerArea = Math.abs(faces[0]!.area());
      const holesArea = faces.slice(1).reduce((sum, face) => sum + Math.abs(face.area()), 0);
      const plan = planLayout({
        area: { outer: yard.outer, holes: yard.holes },
        roll: { widthFt: 15 },
        grain: { angleDeg: 90 },
      });
      expect(Math.abs(plan.areaSqFt - (outerArea - holesArea))).toBeLessThanOrEqual(0.01);
      const perimeter = faces.reduce((sum, face) => sum + face.perimeter, 0);
      expect(Math.abs(plan.perimeterFt - perimeter)).toBeLessThanOrEqual(0.01);
    });
  }
});
