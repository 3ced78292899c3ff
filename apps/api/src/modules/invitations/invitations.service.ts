// Inviting people into a company and accepting an invitation (new or existing user).
import type {
  AcceptInvitationInput,
  CreateInvitationInput,
  InvitationPreview,
  InvitationView,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { invitationMail } from '../../mail/templates.js';
import { hashPassword, verifyPassword } from '../../passwords.js';
import { createOneTimeToken, hashToken } from '../../tokens.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { createUser, unsafeFindUserByEmail } from '../auth/auth.repository.js';
import type { SignedInUser } from '../auth/auth.service.js';
import { findCompanyById, findUserById } from '../me/me.repository.js';
import { addMember, findMembershipOfUserInCompany } from '../members/members.repository.js';
import {
  createInvitation,
  deleteInvitation,
  deletePendingInvitationsFor,
  findInvitation,
  listInvitations,
  markInvitationAccepted,
  unsafeFindOpenInvitationByTokenHash,
} from './invitations.repository.js';

const invitationLifetimeMs = 7 * 24 * 60 * 60 * 1000;
const tokenInvalid = () =>
  new AppError('TOKEN_INVALID', 'This invitation has expired, was revoked or was already used');

function toView(row: {
  id: string;
  email: string;
  role: InvitationView['role'];
  expiresAt: Date;
  acceptedAt: Date | null;
  createdAt: Date;
}): InvitationView {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    expiresAt: row.expiresAt.toISOString(),
    acceptedAt: row.acceptedAt ? row.acceptedAt.toISOString() : null,
    createdAt: row.createdAt.toISOString(),
  };
}

export function createInvitationsService({ env, sequelize, mailer, logger }: ServiceDeps) {
  async function invite(
    ctx: RequestContext,
    input: CreateInvitationInput,
  ): Promise<InvitationView> {
    const { token, tokenHash } = createOneTimeToken();
    const invitation = await inTransaction(sequelize, async (tx) => {
      const existing = await unsafeFindUserByEmail(input.email, tx);
      if (existing && (await findMembershipOfUserInCompany(ctx, existing.id, tx)).length > 0) {
        throw new AppError('CONFLICT', 'That person is already a member of this company');
      }
      await deletePendingInvitationsFor(ctx, input.email, tx);
      const expiresAt = new Date(Date.now() + invitationLifetimeMs);
      const row = await createInvitation(
        ctx,
        { email: input.email, role: input.role, tokenHash, expiresAt },
        tx,
      );
      await recordAuditEvent(
        ctx,
        {
          action: 'invitation.created',
          entity: 'invitation',
          entityId: row.id,
          data: { email: input.email, role: input.role },
        },
        tx,
      );
      return row;
    });
    const [company, inviter] = await Promise.all([
      findCompanyById(ctx.companyId),
      findUserById(ctx.userId),
    ]);
    const link = `${env.appUrl}/invitations/${token}`;
    const content = invitationMail({
      companyName: company?.name ?? 'a company',
      inviterName: inviter?.name ?? 'Someone',
      role: input.role,
      link,
    });
    try {
      await mailer.send({ to: input.email, ...content });
    } catch (error) {
      logger.error(
        { err: error, invitationId: invitation.id },
        'invitation e-mail could not be sent',
      );
    }
    return toView(invitation);
  }

  async function list(ctx: RequestContext): Promise<InvitationView[]> {
    return (await listInvitations(ctx)).map(toView);
  }

  async function revoke(ctx: RequestContext, id: string): Promise<void> {
    await inTransaction(sequelize, async (tx) => {
      const invitation = await findInvitation(ctx, id, tx);
      if (!invitation) throw notFound('Invitation');
      if (invitation.acceptedAt)
        throw new AppError(
          'CONFLICT',
          'This invitation was already accepted; remove the member instead',
        );
      await deleteInvitation(ctx, id, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'invitation.revoked',
          entity: 'invitation',
          entityId: id,
          data: { email: invitation.email },
        },
        tx,
      );
    });
  }

  async function preview(token: string): Promise<InvitationPreview> {
    const invitation = await unsafeFindOpenInvitationByTokenHash(hashToken(token), new Date());
    if (!invitation) throw tokenInvalid();
    const user = await unsafeFindUserByEmail(invitation.email);
    return {
      companyName: invitation.companyName,
      email: invitation.email,
      role: invitation.role,
      hasAccount: user !== null,
    };
  }

  /** New e-mail: creates the user. Known e-mail: the password must be theirs. Then joins the company. */
  async function accept(token: string, input: AcceptInvitationInput): Promise<SignedInUser> {
    return inTransaction(sequelize, async (tx) => {
      const now = new Date();
      const invitation = await unsafeFindOpenInvitationByTokenHash(hashToken(token), now, tx);
      if (!invitation) throw tokenInvalid();
      let user = await unsafeFindUserByEmail(invitation.email, tx);
      if (user) {
        if (!(await verifyPassword(input.password, user.passwordHash))) {
          throw new AppError(
            'INVALID_CREDENTIALS',
            'That is not the password of the account with this e-mail',
          );
        }
      } else {
        if (!input.name) {
          throw new AppError('VALIDATION_FAILED', 'name: Your name is required', {
            errors: [{ path: 'name', message: 'Your name is required' }],
          });
        }
        const passwordHash = await hashPassword(input.password, env.bcryptCost);
        user = await createUser({ name: input.name, email: invitation.email, passwordHash }, tx);
      }
      const ctx: RequestContext = {
        userId: user.id,
        companyId: invitation.companyId,
        role: invitation.role,
      };
      if ((await findMembershipOfUserInCompany(ctx, user.id, tx)).length === 0) {
        await addMember(ctx, user.id, invitation.role, tx);
      }
      await markInvitationAccepted(ctx, invitation.id, now, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'member.joined',
          entity: 'member',
          entityId: null,
          data: { invitationId: invitation.id, role: invitation.role },
        },
        tx,
      );
      return { userId: user.id, companyId: invitation.companyId };
    });
  }

  return { invite, list, revoke, preview, accept };
}
