// Locate tickets (the one-call / 811 request) of a job: what is sent and what is answered. The
// times come from @seamwright/domain's region rules in the company's zone.
import { locateTicketStatuses } from '@seamwright/domain';
import type { LocateTicketStatus } from '@seamwright/domain';
import { z } from 'zod';
import { requiredText } from './text.js';

export const createLocateTicketInputSchema = z.object({
  number: requiredText('Ticket number', 40),
  /** When the notice was given, with its offset or `Z`; not in the future (checked by the API). */
  calledAt: z.iso.datetime({
    offset: true,
    error: 'Use an ISO date-time with its offset, like 2025-09-06T10:00:00-05:00',
  }),
});
export type CreateLocateTicketInput = z.input<typeof createLocateTicketInputSchema>;
export type CreateLocateTicketData = z.output<typeof createLocateTicketInputSchema>;

/** The office records the operators' answer; `expired` is computed, never set. */
export const locateTicketSettableStatuses = ['clear', 'conflict'] as const;

export const updateLocateTicketInputSchema = z.object({
  status: z.enum(locateTicketSettableStatuses, {
    error: 'Status is clear or conflict (requested is where a ticket starts; expired is computed)',
  }),
});
export type UpdateLocateTicketInput = z.input<typeof updateLocateTicketInputSchema>;

export { locateTicketStatuses };
export type { LocateTicketStatus };

export const locateTicketStatusLabels: Record<LocateTicketStatus, string> = {
  requested: 'Requested',
  clear: 'Clear',
  conflict: 'Conflict',
  expired: 'Expired',
};

export interface LocateTicketView {
  id: string;
  jobId: string;
  number: string;
  calledAt: string;
  /** Earliest lawful start of digging (ISO instant). */
  earliestDigAt: string;
  /** The ticket is valid until this instant. */
  expiresAt: string;
  /** Digging must start before this instant, or the notice was too early; null = no limit. */
  latestStartAt: string | null;
  /** `expired` once expiresAt has passed, whatever was recorded. */
  status: LocateTicketStatus;
  rule: {
    id: string;
    /** The company's region as read (`US-TX`), or null. */
    region: string | null;
    /** True when the region had no rule and the generic default was used. */
    isDefault: boolean;
    title: string;
    source: string;
    /** How far ahead of digging a notice may be given (for `checkDigDate`); null = no limit. */
    maxAhead: { days: number; unit: 'calendar' | 'business' } | null;
    /** The counting in words ("Notice Sat 2025-09-06 10:00: … → earliest dig …"). */
    explanation: string;
  };
  timeZone: string;
  createdAt: string;
  updatedAt: string;
}
