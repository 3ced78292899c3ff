import type { PublicEstimateView } from '@seamwright/shared';

/** A made-up estimate as the public route answers it, for the page's tests. */
export function viewFixture(overrides: Partial<PublicEstimateView> = {}): PublicEstimateView {
  const tier = (id: string, name: string, totalCents: number) => ({
    id,
    name,
    lines: [
      {
        label: 'Turf, installed',
        quantity: 1020,
        unit: 'sq ft',
        unitPriceCents: 800,
        amountCents: 816000,
      },
    ],
    subtotalCents: totalCents,
    taxCents: 0,
    totalCents,
    depositCents: 50000,
  });
  return {
    company: {
      name: 'Larkspur Lawns',
      address: '4 Reed Lane',
      phone: '555-0100',
      email: 'office@larkspur.test',
    },
    customer: { name: 'Osric Fennimore' },
    siteAddress: '12 Larch Row, Brindleford',
    jobTitle: 'Back yard play lawn',
    number: 'E-1A2B3C4D',
    version: 1,
    status: 'sent',
    issuedOn: '2026-03-04',
    validUntil: '2026-04-03',
    currency: 'USD',
    notes: null,
    tiers: [tier('t-good', 'Good', 816000), tier('t-best', 'Best', 990000)],
    chosenTierId: null,
    roundingRule: 'Turf is ordered in whole feet of roll length.',
    areas: [],
    cautions: [],
    units: 'imperial',
    cancellation: { applies: false, detail: 'Accepted online.', notice: null },
    answer: null,
    ...overrides,
  };
}
