// Invented demo roll stock: deliveries in a few dye lots, one remnant, and the sold jobs whose
// turf is held on it. Lot numbers are made up.
export interface DemoDelivery {
  turfKey: string;
  dyeLot: string;
  location: string;
  receivedOn: string;
  rolls: { widthFt: number; lengthFt: number }[];
}

export const demoDeliveries: DemoDelivery[] = [
  {
    turfKey: 'turf-landscape-175',
    dyeLot: 'QM-24117',
    location: 'Yard rack A',
    receivedOn: '2026-10-14',
    rolls: [
      { widthFt: 15, lengthFt: 100 },
      { widthFt: 15, lengthFt: 100 },
      { widthFt: 12, lengthFt: 100 },
      { widthFt: 12, lengthFt: 100 },
    ],
  },
  {
    turfKey: 'turf-landscape-175',
    dyeLot: 'QM-25002',
    location: 'Yard rack B',
    receivedOn: '2026-11-20',
    rolls: [{ widthFt: 15, lengthFt: 75 }],
  },
  {
    turfKey: 'turf-pet-125',
    dyeLot: 'PT-3390',
    location: 'Yard rack C',
    receivedOn: '2026-11-02',
    rolls: [{ widthFt: 15, lengthFt: 100 }],
  },
];

export const demoRemnants = [
  {
    turfKey: 'turf-landscape-175',
    dyeLot: 'QM-24117',
    widthFt: 15,
    lengthFt: 14,
    location: 'Remnant shelf',
  },
];

/** Sold demo jobs whose turf is reserved on the stock above. */
export const demoReservedJobTitles = ['Dog run with pet infill', 'Play yard with fall padding'];
