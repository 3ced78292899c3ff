import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import type { CutSheetEntry } from '@seamwright/takeoff';
import { testSession, WithSession } from '../../test/session-fixture';
import { CutSheetTable } from './cut-sheet-table';

const cut = (
  n: number,
  across: [number, number],
  along: [number, number],
  edge: [number, number],
) => ({
  cut: n,
  acrossFromFt: across[0],
  acrossToFt: across[1],
  alongFromFt: along[0],
  alongToFt: along[1],
  goes: 'decimal text the screen no longer shows',
  position: 'north-west',
  fromEdge: 'west',
  fromEdgeStartFt: edge[0],
  fromEdgeEndFt: edge[1],
});

const entries: CutSheetEntry[] = [
  {
    piece: 0,
    lengthFt: 20.5,
    widthFt: 15,
    cuts: [cut(0, [0, 15], [0, 20.5], [0, 15])],
    grainArrow: { angleDeg: 90, bearingDeg: 0, compass: 'N' },
  },
  {
    piece: 1,
    lengthFt: 32 + 7.5 / 12,
    widthFt: 12,
    cuts: [cut(1, [0, 6.25], [0, 12], [15, 21.25]), cut(2, [6.25, 12], [12, 32.625], [21.25, 27])],
    grainArrow: { angleDeg: 90, bearingDeg: 0, compass: 'N' },
  },
];

function rows() {
  return within(screen.getByRole('table', { name: 'Cut sheet' }))
    .getAllByRole('row')
    .slice(1);
}

describe('CutSheetTable', () => {
  it('gives every length in feet and inches, as crews read a tape', () => {
    render(<CutSheetTable entries={entries} />);
    const [first, second] = rows() as [HTMLElement, HTMLElement];
    expect(first.textContent).toBe(
      `1${`20' 6"`}${`15' 0"`}north-west, 0' 0"–15' 0" from the west edgeN`,
    );
    expect(within(second).getByText(`32' 7 1/2"`)).toBeTruthy();
    expect(within(second).getByText(`12' 0"`)).toBeTruthy();
    const cuts = within(second)
      .getAllByRole('listitem')
      .map((item) => item.textContent);
    expect(cuts).toEqual([
      `0' 0"–6' 3" across × 0' 0"–12' 0" along: north-west, 15' 0"–21' 3" from the west edge`,
      `6' 3"–12' 0" across × 12' 0"–32' 7 1/2" along: north-west, 21' 3"–27' 0" from the west edge`,
    ]);
    expect(screen.getByRole('table', { name: 'Cut sheet' }).textContent).not.toMatch(/\d ft|\.\d/);
  });

  it('gives metres for a metric company', () => {
    render(
      <WithSession me={testSession({ measurementSystem: 'metric' })}>
        <CutSheetTable entries={entries} />
      </WithSession>,
    );
    const [first] = rows() as [HTMLElement];
    // 20.5 ft × 0.3048 = 6.2484 m; 15 ft = 4.572 m
    expect(first.textContent).toBe('16.25 m4.57 mnorth-west, 0–4.57 m from the west edgeN');
  });
});
