// An invented estimate for the sample script and the document's tests: an invented company
// and customer, two tiers, an L-shaped back yard and a front yard with a planter and a
// walkway, planned by the real layout planner. Not used by request code.
import { cancellationNotice } from '@seamwright/domain';
import { cautionsFor, planLayout } from '@seamwright/takeoff';
import type { LayoutPoint, LayoutRequestInput } from '@seamwright/takeoff';
import { documentCancellationNotice } from './cancellation-notice-input.js';
import type {
  EstimateDocumentArea,
  EstimateDocumentInput,
  EstimateDocumentLine,
  EstimateDocumentTier,
} from './estimate-document.types.js';

const taxBasisPoints = 825;
const depositBasisPoints = 3000;

/** Half-up rounding of `cents × basisPoints / 10 000`, in integers (the rule the sample states). */
function shareOf(cents: number, basisPoints: number): number {
  return Math.floor((cents * basisPoints + 5_000) / 10_000);
}

function line(
  label: string,
  quantity: number,
  unit: string,
  unitPriceCents: number,
): EstimateDocumentLine {
  // Sample quantities are whole or quarter units, so the product rounds only at half cents.
  return {
    label,
    quantity,
    unit,
    unitPriceCents,
    amountCents: Math.round(quantity * unitPriceCents),
  };
}

function tier(name: string, lines: EstimateDocumentLine[]): EstimateDocumentTier {
  const subtotalCents = lines.reduce((sum, l) => sum + l.amountCents, 0);
  const taxCents = shareOf(subtotalCents, taxBasisPoints);
  const totalCents = subtotalCents + taxCents;
  return {
    name,
    lines,
    subtotalCents,
    taxCents,
    totalCents,
    depositCents: shareOf(totalCents, depositBasisPoints),
  };
}

function area(name: string, request: LayoutRequestInput): EstimateDocumentArea {
  const plan = planLayout(request);
  const paths = (request.trafficPaths ?? []).map((path) =>
    'points' in path
      ? { points: path.points, widthFt: path.widthFt ?? 3 }
      : { points: path, widthFt: 3 },
  );
  return {
    name,
    areaSqFt: plan.areaSqFt,
    outline: { outer: request.area.outer, holes: request.area.holes ?? [] },
    trafficPaths: paths,
    plan,
  };
}

const backYard: LayoutPoint[] = [
  [0, 0],
  [46, 0],
  [46, 18],
  [24, 18],
  [24, 34],
  [0, 34],
];
const frontYard: LayoutPoint[] = [
  [0, 0],
  [38, 0],
  [38, 22],
  [0, 22],
];
const planter: LayoutPoint[] = [
  [25, 8],
  [31, 8],
  [31, 14],
  [25, 14],
];

const shared: EstimateDocumentLine[] = [
  line('Remove existing sod and haul away', 2_012, 'sq ft', 85),
  line('Compacted base, 3 in, crushed rock', 2_012, 'sq ft', 120),
  line('Weed barrier fabric', 2_012, 'sq ft', 18),
  line('Bender board edging where turf meets planting beds', 96, 'ft', 340),
  line('Seaming tape and adhesive', 118, 'ft', 275),
  line('Installation labour', 2_012, 'sq ft', 225),
];

export function sampleEstimateDocumentInput(
  options: { cancellation?: boolean; areas?: boolean } = {},
): EstimateDocumentInput {
  const notice = cancellationNotice({
    sellerName: 'Cedar Flats Turf Co.',
    sellerAddress: '1180 Quarry Road, Unit 4\nMarlow Springs, CA 95000',
    saleDate: '2027-03-08',
    lastDay: '2027-03-11',
    businessDays: 3,
  });
  return {
    company: {
      name: 'Cedar Flats Turf Co.',
      address: '1180 Quarry Road, Unit 4\nMarlow Springs, CA 95000',
      phone: '(555) 014-2290',
      email: 'office@cedarflats.example',
    },
    customer: { name: 'Priya Okonkwo-Lindqvist', email: 'priya.ol@example.com' },
    siteAddress: '42 Larkspur Lane\nMarlow Springs, CA 95001',
    jobTitle: 'Back and front yard: pet-friendly turf',
    estimate: { number: 'E-2027-0042', version: 2 },
    issuedOn: '2027-03-08',
    validUntil: '2027-04-07',
    currency: 'USD',
    notes:
      'Sprinkler heads inside the turf areas will be capped. The dog run along the fence gets extra infill.\n\nPlease keep pets indoors on installation days.',
    terms:
      'Work starts after the deposit is received and the utility locate has cleared. The balance is due on completion. Materials stay the property of the installer until paid in full.\n\nWorkmanship is guaranteed for 3 years from completion; the turf carries its maker’s warranty.',
    tiers: [
      tier('Everyday pet turf', [
        line('Pet turf, 1 1/4 in pile, 15 ft roll', 2_250, 'sq ft', 289),
        line('Antimicrobial infill, coated sand', 38, 'bags', 2_450),
        ...shared,
      ]),
      tier('Premium cooling turf', [
        line('Premium turf with cooling fibre, 1 3/4 in pile, 15 ft roll', 2_250, 'sq ft', 412),
        line('Cooling infill, coated sand', 38, 'bags', 3_190),
        ...shared,
      ]),
    ],
    roundingRule:
      'Line amounts are quantity × unit price in whole cents. Tax (8.25 %) is worked out once on the subtotal and the deposit (30 %) once on the total, each rounded half up to the cent.',
    areas:
      options.areas === false
        ? []
        : [
            area('Back yard', {
              area: { outer: backYard },
              roll: { widthFt: 15, maxLengthFt: 100 },
            }),
            area('Front yard', {
              area: { outer: frontYard, holes: [planter] },
              roll: { widthFt: 15, maxLengthFt: 100 },
              grain: { angleDeg: 90 },
              trafficPaths: [
                {
                  points: [
                    [0, 5],
                    [20, 5],
                    [20, 22],
                  ],
                  widthFt: 3,
                },
              ],
            }),
          ],
    cautions: cautionsFor({
      usage: 'pet',
      infillKinds: ['coated-sand'],
      isDigging: true,
      rollWeightLb: 980,
    }).map((caution) => ({ title: caution.title, text: caution.body })),
    cancellationNotice: options.cancellation
      ? documentCancellationNotice(
          notice,
          'You may cancel this sale until midnight at the end of Thursday, March 11, 2027.',
        )
      : null,
    units: 'imperial',
  };
}
