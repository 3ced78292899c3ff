// Invented demo customers and their sites in the invented town of Quillmere. Any likeness to
// real people or places is accidental.
export interface DemoSite {
  label: string | null;
  addressLine1: string;
  accessNotes: string | null;
  pets: string | null;
  hazards: string | null;
  sprinklerHeads: number | null;
}

export interface DemoCustomer {
  name: string;
  email: string | null;
  phone: string | null;
  notes: string | null;
  archived?: boolean;
  sites: DemoSite[];
}

export const demoTown = { city: 'Quillmere', postalCode: '80999' };

export const demoCustomers: DemoCustomer[] = [
  {
    name: 'Odalys Fenwright',
    email: 'odalys.fenwright@example.test',
    phone: '(555) 014-2207',
    notes: 'Wants the back yard done before the spring party.',
    sites: [
      {
        label: 'Back yard',
        addressLine1: '14 Larkspur Bend',
        accessNotes: 'Side gate code 4471; latch sticks.',
        pets: 'Two beagles, kept inside on install days.',
        hazards: 'Shallow gas line along the north fence (marked last year).',
        sprinklerHeads: 9,
      },
    ],
  },
  {
    name: 'Torvald & Sunniva Brackett',
    email: 'brackett.household@example.test',
    phone: '555-014-3390',
    notes: null,
    sites: [
      {
        label: 'Front lawn',
        addressLine1: '202 Thimbleweed Row',
        accessNotes: 'Park on the street; driveway is shared.',
        pets: null,
        hazards: 'Steep slope by the mailbox.',
        sprinklerHeads: 6,
      },
      {
        label: 'Dog run',
        addressLine1: '202 Thimbleweed Row',
        accessNotes: 'Through the garage.',
        pets: 'Large husky; needs pet infill.',
        hazards: null,
        sprinklerHeads: 0,
      },
    ],
  },
  {
    name: 'Quillmere Little Sprouts Preschool',
    email: 'office@littlesprouts.example.test',
    phone: '555 014 8812',
    notes: 'Play area: fall-height padding under the climbing frame.',
    sites: [
      {
        label: 'Play yard',
        addressLine1: '9 Corbel Street',
        accessNotes: 'Work only after 6 pm or on weekends.',
        pets: null,
        hazards: 'Children on site in daytime; fence the work area.',
        sprinklerHeads: 14,
      },
    ],
  },
  {
    name: 'Marisol Ketteridge',
    email: 'mketteridge@example.test',
    phone: '(555) 014-6620',
    notes: null,
    sites: [
      {
        label: null,
        addressLine1: '77 Hollowmint Lane',
        accessNotes: 'Narrow side path, 34 in wide: carry rolls by hand.',
        pets: 'Cat',
        hazards: null,
        sprinklerHeads: 4,
      },
    ],
  },
  {
    name: 'Dunmore Pike Putting Club',
    email: 'greens@dunmorepike.example.test',
    phone: '555-014-1188',
    notes: 'Putting green; asks for a fast-roll surface.',
    sites: [
      {
        label: 'Practice green',
        addressLine1: '1 Dunmore Pike',
        accessNotes: 'Check in at the clubhouse.',
        pets: null,
        hazards: 'Irrigation main crosses the east corner.',
        sprinklerHeads: 11,
      },
    ],
  },
  {
    name: 'Ines Harrowgate',
    email: null,
    phone: '555 014 7043',
    notes: 'Prefers phone calls; no e-mail.',
    sites: [
      {
        label: 'Courtyard',
        addressLine1: '31 Saltbush Court',
        accessNotes: 'Key under the blue planter.',
        pets: null,
        hazards: 'Wasp nest under the eaves.',
        sprinklerHeads: 3,
      },
    ],
  },
  {
    name: 'Bexley Ashcombe',
    email: 'bexley.ashcombe@example.test',
    phone: null,
    notes: null,
    sites: [
      {
        label: 'Side strip',
        addressLine1: '508 Wrenfield Avenue',
        accessNotes: null,
        pets: 'Tortoise in the back yard; keep gates shut.',
        hazards: null,
        sprinklerHeads: 2,
      },
      {
        label: 'Rental unit',
        addressLine1: '510 Wrenfield Avenue',
        accessNotes: 'Tenant must be told 48 h ahead.',
        pets: null,
        hazards: 'Loose pavers by the steps.',
        sprinklerHeads: 5,
      },
    ],
  },
  {
    name: 'Quillmere Grange Hall Trust',
    email: 'trustees@grangehall.example.test',
    phone: '555-014-5501',
    notes: 'Board approves quotes at the monthly meeting.',
    sites: [
      {
        label: 'Front verge',
        addressLine1: '60 Mill Race Road',
        accessNotes: 'Public footpath stays open.',
        pets: null,
        hazards: 'Overhead power line above the verge.',
        sprinklerHeads: 8,
      },
    ],
  },
  {
    name: 'Yusuf Pellinore',
    email: 'yusuf.p@example.test',
    phone: '(555) 014-9034',
    notes: null,
    sites: [
      {
        label: 'Back yard',
        addressLine1: '18 Gorsehill Crescent',
        accessNotes: 'Gate on the alley side.',
        pets: 'Two retrievers',
        hazards: 'Old septic lid near the shed.',
        sprinklerHeads: 12,
      },
    ],
  },
  {
    name: 'Henrietta Vosburgh',
    email: 'hvosburgh@example.test',
    phone: '555-014-2716',
    notes: 'Lost to a cheaper quote last season.',
    archived: true,
    sites: [
      {
        label: null,
        addressLine1: '3 Quarrystone Walk',
        accessNotes: null,
        pets: null,
        hazards: null,
        sprinklerHeads: null,
      },
    ],
  },
  {
    name: 'Castellan Row Townhomes HOA',
    email: 'board@castellanrow.example.test',
    phone: '555-014-6002',
    notes: 'Six common-area strips; phased over two months.',
    sites: [
      {
        label: 'Strip A (entrance)',
        addressLine1: '1–11 Castellan Row',
        accessNotes: 'Residents park along the strip until 8 am.',
        pets: 'Many dogs walked here; pet infill.',
        hazards: 'Drip line under mulch.',
        sprinklerHeads: 16,
      },
      {
        label: 'Strip B (pool side)',
        addressLine1: '13–25 Castellan Row',
        accessNotes: 'Pool gate code from the manager.',
        pets: null,
        hazards: 'Wet deck; slip risk.',
        sprinklerHeads: 10,
      },
    ],
  },
  {
    name: 'Pim Okonkwo-Lindqvist',
    email: 'pim.ol@example.test',
    phone: '555 014 3318',
    notes: null,
    sites: [
      {
        label: 'Roof terrace',
        addressLine1: '44 Lanternfield Mews, top floor',
        accessNotes: 'Rolls go up by the freight lift (max 9 ft long).',
        pets: null,
        hazards: 'Parapet 36 in high; harness near the edge.',
        sprinklerHeads: 0,
      },
    ],
  },
];
