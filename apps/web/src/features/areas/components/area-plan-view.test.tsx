import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { testSession, WithSession } from '../../../test/session-fixture';
import { sampleArea } from '../test/sample-area';
import { AreaPlanView } from './area-plan-view';

const caution = {
  key: 'fall-height',
  title: 'Play areas: fall height',
  body: 'Under play equipment the surface must cushion a fall from the equipment’s height.',
  deferral: 'Follow your local codes.',
  reference: 'ASTM F1292',
};

describe('AreaPlanView', () => {
  it('draws the saved plan, its alternatives, the cut sheet and the cautions', () => {
    const area = sampleArea();
    render(
      <WithSession me={testSession()}>
        <AreaPlanView area={area} cautions={[caution]} />
      </WithSession>,
    );
    const [main] = screen.getAllByTestId('plan-drawing');
    // One tinted shape per cut, the walkway hatched, and every seam drawn.
    expect(main?.querySelectorAll('[data-cut]')).toHaveLength(area.plan.cuts.length);
    expect(main?.querySelectorAll('[data-walkway]')).toHaveLength(1);
    expect(main?.querySelectorAll('[data-seam]')).toHaveLength(area.plan.seamLines.length);
    // 1,020 sq ft: 40 × 30 − 15 × 12 (arithmetic).
    const figures = screen.getByRole('group', { name: 'Plan figures' });
    expect(within(figures).getByText('1,020 sq ft')).toBeTruthy();
    expect(within(figures).getByText(`Base 0' 3" deep`)).toBeTruthy();

    const ways = screen.getAllByTestId('area-alternative');
    expect(ways).toHaveLength(2);
    expect(within(ways[1]!).getByRole('heading', { name: '12 ft roll' })).toBeTruthy();
    expect(within(ways[1]!).getByText(`12' 0" roll, grain`, { exact: false })).toBeTruthy();
    expect(screen.getAllByTestId('plan-drawing')).toHaveLength(3);

    const sheet = screen.getByRole('table', { name: 'Cut sheet' });
    expect(sheet.querySelectorAll('tbody tr')).toHaveLength(area.plan.cutSheet.length);
    expect(
      screen.getByRole('complementary', { name: 'Caution: Play areas: fall height' }),
    ).toBeTruthy();
  });

  it('shows metres to a metric company', () => {
    render(
      <WithSession me={testSession({ measurementSystem: 'metric' })}>
        <AreaPlanView area={sampleArea()} cautions={[]} />
      </WithSession>,
    );
    // 1,020 sq ft = 94.76 m² (1 sq ft = 0.09290304 m²).
    expect(
      within(screen.getByRole('group', { name: 'Plan figures' })).getByText('94.76 m²'),
    ).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Cautions' })).toBeNull();
  });
});
