// Ticket status: what the office sets (requested → clear | conflict), and `expired` computed
// once the ticket's life has passed, whatever was set.
export const locateTicketStatuses = ['requested', 'clear', 'conflict', 'expired'] as const;
export type LocateTicketStatus = (typeof locateTicketStatuses)[number];

/** Moves the office may make by hand; `expired` is never set, only computed. */
const allowedMoves: Record<LocateTicketStatus, readonly LocateTicketStatus[]> = {
  requested: ['clear', 'conflict'],
  clear: ['conflict'],
  conflict: ['clear'],
  expired: [],
};

export function allowedLocateStatusMoves(from: LocateTicketStatus): readonly LocateTicketStatus[] {
  return allowedMoves[from];
}

/** The status to show at `now`: `expired` once `expiresAt` has passed. */
export function effectiveLocateStatus(
  stored: LocateTicketStatus,
  expiresAt: Date | string,
  now: Date,
): LocateTicketStatus {
  return now.getTime() >= new Date(expiresAt).getTime() ? 'expired' : stored;
}
