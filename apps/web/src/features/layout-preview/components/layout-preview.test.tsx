import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { LayoutPreview } from './layout-preview';

function renderAt(url: string) {
  const router = createMemoryRouter([{ path: '/layout', Component: LayoutPreview }], {
    initialEntries: [url],
  });
  render(<RouterProvider router={router} />);
  return router;
}

function figure(term: string): HTMLElement {
  const figures = screen.getByRole('group', { name: 'Plan figures' });
  const dt = within(figures).getByText(term, { selector: 'dt' });
  return dt.parentElement as HTMLElement;
}

describe('LayoutPreview', () => {
  it('plans a 30 × 20 ft rectangle, grain east–west, as 600 sq ft in two pieces', () => {
    // Check value: 30 × 20 ft with a 15 ft roll, grain along the 20 ft side → two 15 × 20 ft
    // pieces, 600 sq ft, one 20 ft seam (arithmetic; TRADE.md row 1).
    renderAt(
      `/layout?len=${encodeURIComponent(`30'`)}&wid=${encodeURIComponent(`20'`)}&grain=east-west`,
    );
    expect(within(figure('Turf ordered')).getByText('600 sq ft')).toBeTruthy();
    expect(within(figure('Turf ordered')).getByText('66.67 sq yd')).toBeTruthy();
    expect(within(figure('Pieces')).getByText('2')).toBeTruthy();
    expect(within(figure('Seams')).getByText('side 20 ft · butt 0 ft')).toBeTruthy();
    expect(screen.getByText('Piece 1 — 15 × 20 ft')).toBeTruthy();
    const drawing = screen.getByRole('img', { name: /Layout plan/ });
    expect(drawing.querySelectorAll('[data-cut]')).toHaveLength(2);
    expect(drawing.querySelectorAll('[data-seam="side"]')).toHaveLength(1);
    expect(
      screen.getByRole('table', { name: 'Cut sheet' }).querySelectorAll('tbody tr'),
    ).toHaveLength(2);
    expect(
      screen.getByText(
        'Using standard estimating defaults; your company’s own settings come later.',
      ),
    ).toBeTruthy();
    expect(
      screen.getByRole('complementary', { name: 'Caution: Turf gets very hot in the sun' }),
    ).toBeTruthy();
  });

  it('shows the length parser’s message under the field as you type, and greys the last plan', async () => {
    renderAt('/layout');
    fireEvent.change(screen.getByLabelText('Width (east–west)'), { target: { value: `20' 14"` } });
    const input = screen.getByLabelText('Width (east–west)');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/^Inches must be less than 12/)).toBeTruthy();
    expect(await screen.findByText(/Showing the last plan that worked/)).toBeTruthy();
  });

  it('puts the planner’s refusal in the alert region and writes the typed state to the URL', async () => {
    const router = renderAt('/layout?shape=points');
    fireEvent.change(screen.getByLabelText('Outline points (feet)'), {
      target: { value: '0, 0\n10, 10\n10, 0\n0, 10' },
    });
    await waitFor(() =>
      expect(screen.getAllByRole('alert').map((a) => a.textContent)).toContainEqual(
        expect.stringMatching(/^The outline: ring self-intersects/),
      ),
    );
    expect(router.state.location.search).toContain('pts=0%2C+0%0A10%2C+10');
    expect(screen.getByRole('img', { name: /Layout plan/ }).closest('[data-stale]')).toBeTruthy();
  });

  it('names bed feet in the perimeter and adds edging once the north edge meets a planting bed', async () => {
    const router = renderAt(
      `/layout?len=${encodeURIComponent(`20'`)}&wid=${encodeURIComponent(`30'`)}`,
    );
    expect(within(figure('Perimeter')).getByText('100 ft not tagged yet')).toBeTruthy();
    const north = screen.getByRole('combobox', { name: 'North edge' });
    expect((north as HTMLSelectElement).value).toBe('unknown');
    for (const side of ['East edge', 'South edge', 'West edge'])
      expect(screen.getByRole('combobox', { name: side })).toBeTruthy();
    fireEvent.change(north, { target: { value: 'bed' } });
    // Check value: the north side is the 30 ft east–west width; 20 + 30 + 20 = 70 ft left (arithmetic).
    await waitFor(() =>
      expect(
        within(figure('Perimeter')).getByText('30 ft against beds · 70 ft not tagged yet'),
      ).toBeTruthy(),
    );
    const takeoff = screen.getByRole('table', { name: 'Material takeoff' });
    expect(within(takeoff).getByText('Edging / bender board')).toBeTruthy();
    expect(router.state.location.search).toContain('redges=bed%2Cunknown%2Cunknown%2Cunknown');
  });
});
