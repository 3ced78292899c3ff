import type { Request, Response } from 'express';
import { auditEventListQuerySchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import { listAuditEventsPage } from './audit.service.js';

export async function listAuditEventsHandler(req: Request, res: Response): Promise<void> {
  const query = parseInput(auditEventListQuerySchema, req.query);
  res.json(await listAuditEventsPage(contextOf(req), query));
}
