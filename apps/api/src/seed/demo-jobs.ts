// Invented demo jobs at several points of the lifecycle, by demo customer name and the index of
// that customer's site (demo-customers.ts).
import type { JobStatus } from '@seamwright/domain';

export interface DemoJob {
  customer: string;
  site: number;
  title: string;
  status: JobStatus;
}

export const demoJobs: DemoJob[] = [
  { customer: 'Odalys Fenwright', site: 0, title: 'Back yard lawn and path', status: 'lead' },
  {
    customer: 'Torvald & Sunniva Brackett',
    site: 0,
    title: 'Front lawn on the slope',
    status: 'estimated',
  },
  {
    customer: 'Torvald & Sunniva Brackett',
    site: 1,
    title: 'Dog run with pet infill',
    status: 'accepted',
  },
  {
    customer: 'Quillmere Little Sprouts Preschool',
    site: 0,
    title: 'Play yard with fall padding',
    status: 'scheduled',
  },
  { customer: 'Marisol Ketteridge', site: 0, title: 'Side yard refresh', status: 'installed' },
  { customer: 'Dunmore Pike Putting Club', site: 0, title: 'Practice green', status: 'paid' },
  { customer: 'Ines Harrowgate', site: 0, title: 'Patio surround', status: 'lost' },
  // Estimated when seeded; its estimate is then sent and signed at the office (demo-estimates).
  { customer: 'Ines Harrowgate', site: 0, title: 'Front courtyard lawn', status: 'estimated' },
];
