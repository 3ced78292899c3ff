import type { Request, Response } from 'express';
import { previewPlan } from './plans.service.js';

export function previewPlanHandler(req: Request, res: Response): void {
  res.json({ data: previewPlan(req.body) });
}
