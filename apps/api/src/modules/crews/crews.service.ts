// Crews of a company: people, colour, working days and jobs a day. A crew with bookings is
// archived rather than deleted, so its past bookings keep their crew.
import { crewColourHex } from '@seamwright/shared';
import type {
  CreateCrewData,
  CrewColour,
  CrewDeletion,
  CrewMemberInput,
  CrewView,
  UpdateCrewData,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import type { CrewMemberRow, CrewRow } from './crews.repository.js';
import {
  countBookingsOfCrew,
  createCrew,
  deleteCrew,
  findCrew,
  listCrewMembers,
  listCrews,
  membersAmong,
  replaceCrewMembers,
  updateCrew,
} from './crews.repository.js';

export function toCrewView(crew: CrewRow, members: CrewMemberRow[]): CrewView {
  return {
    id: crew.id,
    name: crew.name,
    colour: crew.colour as CrewColour,
    colourHex: crewColourHex(crew.colour),
    workingDays: crew.workingDays,
    jobsPerDay: crew.jobsPerDay,
    members: members
      .filter((m) => m.crewId === crew.id)
      .map((m) => ({
        id: m.id,
        userId: m.userId,
        name: m.userId ? (m.user?.name ?? 'Former member') : (m.name ?? ''),
        kind: m.userId ? 'lead' : 'helper',
      })),
    archived: crew.archivedAt !== null,
    createdAt: crew.createdAt.toISOString(),
    updatedAt: crew.updatedAt.toISOString(),
  };
}

/** Checks the people: each account a member of this company, none twice. */
async function checkMembers(ctx: RequestContext, members: CrewMemberInput[], tx: Tx) {
  const userIds = members.flatMap((m) => ('userId' in m ? [m.userId.toLowerCase()] : []));
  const known = await membersAmong(ctx, userIds, tx);
  const seen = new Set<string>();
  for (const [index, member] of members.entries()) {
    if (!('userId' in member)) continue;
    const id = member.userId.toLowerCase();
    const message = !known.has(id)
      ? 'No such member in this company'
      : seen.has(id)
        ? 'This person is already on the crew'
        : null;
    if (message)
      throw new AppError('VALIDATION_FAILED', `members.${index}.userId: ${message}`, {
        errors: [{ path: `members.${index}.userId`, message }],
      });
    seen.add(id);
  }
}

export function createCrewsService(deps: Pick<ServiceDeps, 'sequelize'>) {
  const { sequelize } = deps;

  async function list(ctx: RequestContext, includeArchived: boolean): Promise<CrewView[]> {
    const [crews, members] = await Promise.all([
      listCrews(ctx, includeArchived),
      listCrewMembers(ctx),
    ]);
    return crews.map((crew) => toCrewView(crew, members));
  }

  async function get(ctx: RequestContext, id: string): Promise<CrewView> {
    const [crew, members] = await Promise.all([findCrew(ctx, id), listCrewMembers(ctx, [id])]);
    if (!crew) throw notFound('Crew');
    return toCrewView(crew, members);
  }

  async function create(ctx: RequestContext, input: CreateCrewData): Promise<CrewView> {
    const id = await inTransaction(sequelize, async (tx) => {
      await checkMembers(ctx, input.members, tx);
      const crew = await createCrew(
        ctx,
        {
          name: input.name,
          colour: input.colour,
          workingDays: input.workingDays,
          jobsPerDay: input.jobsPerDay,
        },
        tx,
      );
      await replaceCrewMembers(ctx, crew.id, input.members, tx);
      await recordAuditEvent(
        ctx,
        { action: 'crew.created', entity: 'crew', entityId: crew.id, data: { name: crew.name } },
        tx,
      );
      return crew.id;
    });
    return get(ctx, id);
  }

  async function update(ctx: RequestContext, id: string, input: UpdateCrewData): Promise<CrewView> {
    await inTransaction(sequelize, async (tx) => {
      // The crew's row lock also orders this change against bookings being checked on it.
      const crew = await findCrew(ctx, id, tx, true);
      if (!crew) throw notFound('Crew');
      const { members, archived, ...fields } = input;
      const changes = {
        ...fields,
        ...(archived === undefined
          ? {}
          : { archivedAt: archived ? (crew.archivedAt ?? new Date()) : null }),
      };
      if (Object.keys(changes).length > 0) await updateCrew(ctx, id, changes, tx);
      if (members) {
        await checkMembers(ctx, members, tx);
        await replaceCrewMembers(ctx, id, members, tx);
      }
      await recordAuditEvent(
        ctx,
        {
          action: 'crew.changed',
          entity: 'crew',
          entityId: id,
          data: { fields: Object.keys(input) },
        },
        tx,
      );
    });
    return get(ctx, id);
  }

  async function remove(ctx: RequestContext, id: string): Promise<CrewDeletion> {
    return inTransaction(sequelize, async (tx) => {
      const crew = await findCrew(ctx, id, tx, true);
      if (!crew) throw notFound('Crew');
      const bookings = await countBookingsOfCrew(ctx, id, tx);
      if (bookings > 0) {
        if (!crew.archivedAt) await updateCrew(ctx, id, { archivedAt: new Date() }, tx);
        await recordAuditEvent(
          ctx,
          { action: 'crew.archived', entity: 'crew', entityId: id, data: { bookings } },
          tx,
        );
        return {
          id,
          outcome: 'archived',
          message: `${crew.name} has ${bookings} booking${bookings === 1 ? '' : 's'}, so it was archived instead of deleted: its bookings stay on the calendar and it can be restored`,
        };
      }
      await deleteCrew(ctx, id, tx);
      await recordAuditEvent(
        ctx,
        { action: 'crew.deleted', entity: 'crew', entityId: id, data: { name: crew.name } },
        tx,
      );
      return { id, outcome: 'deleted', message: `${crew.name} was deleted` };
    });
  }

  return { list, get, create, update, remove };
}
