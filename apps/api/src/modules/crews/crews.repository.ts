// Rows of `crews` and `crew_members`. Members' names come from their user accounts, joined
// through the member row (users carry no company; the member row is scoped).
import type { RequestContext } from '../../context.js';
import {
  BookingModel,
  CrewMemberModel,
  CrewModel,
  MembershipModel,
  UserModel,
} from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

type CrewAttributes = Awaited<ReturnType<ReturnType<typeof scoped<CrewModel>>['findAll']>>[number];
type MemberAttributes = Awaited<
  ReturnType<ReturnType<typeof scoped<CrewMemberModel>>['findAll']>
>[number];

export interface CrewRow extends Omit<CrewAttributes, 'workingDays'> {
  workingDays: number[];
}
export type CrewMemberRow = MemberAttributes & { user: { name: string } | null };

/** MariaDB hands JSON columns back as text; we wrote the list ourselves. */
function toCrew(row: CrewAttributes): CrewRow {
  const days: unknown =
    typeof row.workingDays === 'string' ? JSON.parse(row.workingDays) : row.workingDays;
  return { ...row, workingDays: (days as number[]).map(Number) };
}

export async function listCrews(ctx: RequestContext, includeArchived: boolean, tx?: Tx) {
  const rows = await scoped(ctx, CrewModel).findAll({
    ...(includeArchived ? {} : { where: { archivedAt: null } }),
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
    ...(tx ? { tx } : {}),
  });
  return rows.map(toCrew);
}

export async function findCrew(ctx: RequestContext, id: string, tx?: Tx, lock = false) {
  const row = await scoped(ctx, CrewModel).findById(id, tx ? { tx, lock } : {});
  return row ? toCrew(row) : null;
}

/** Crews' people in their order; all crews' when `crewIds` is not given. */
export async function listCrewMembers(
  ctx: RequestContext,
  crewIds?: string[],
  tx?: Tx,
): Promise<CrewMemberRow[]> {
  if (crewIds && crewIds.length === 0) return [];
  const rows = await scoped(ctx, CrewMemberModel).findAll({
    ...(crewIds ? { where: { crewId: crewIds } } : {}),
    include: [{ model: UserModel, as: 'user', attributes: ['name'] }],
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
    ...(tx ? { tx } : {}),
  });
  return rows as CrewMemberRow[];
}

/** The crews a person is on (a crew lead sees only these crews' bookings). */
export async function crewIdsOfUser(ctx: RequestContext, userId: string): Promise<string[]> {
  const rows = await scoped(ctx, CrewMemberModel).findAll({
    where: { userId },
    attributes: ['crewId'],
  });
  return rows.map((row) => row.crewId);
}

/** Which of `userIds` are members of this company. */
export async function membersAmong(ctx: RequestContext, userIds: string[], tx: Tx) {
  if (userIds.length === 0) return new Set<string>();
  const rows = await scoped(ctx, MembershipModel).findAll({ where: { userId: userIds }, tx });
  return new Set(rows.map((row) => row.userId));
}

export function createCrew(
  ctx: RequestContext,
  values: { name: string; colour: string; workingDays: number[]; jobsPerDay: number },
  tx: Tx,
) {
  return scoped(ctx, CrewModel).create({ ...values, archivedAt: null }, tx);
}

export function updateCrew(
  ctx: RequestContext,
  id: string,
  values: Partial<{
    name: string;
    colour: string;
    workingDays: number[];
    jobsPerDay: number;
    archivedAt: Date | null;
  }>,
  tx: Tx,
) {
  return scoped(ctx, CrewModel).update(id, values, tx);
}

/** Replaces the crew's people with `members`, in the order given. */
export async function replaceCrewMembers(
  ctx: RequestContext,
  crewId: string,
  members: ({ userId: string } | { name: string })[],
  tx: Tx,
): Promise<void> {
  await scoped(ctx, CrewMemberModel).destroy({ crewId }, tx);
  for (const [position, member] of members.entries())
    await scoped(ctx, CrewMemberModel).create(
      'userId' in member
        ? { crewId, userId: member.userId, name: null, position }
        : { crewId, userId: null, name: member.name, position },
      tx,
    );
}

export function countBookingsOfCrew(ctx: RequestContext, crewId: string, tx: Tx) {
  return scoped(ctx, BookingModel).count({ crewId }, tx);
}

export async function deleteCrew(ctx: RequestContext, id: string, tx: Tx): Promise<void> {
  await scoped(ctx, CrewMemberModel).destroy({ crewId: id }, tx);
  await scoped(ctx, CrewModel).destroy({ id }, tx);
}
