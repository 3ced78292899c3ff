import type { Request, Response } from 'express';
import type { PlannerPool } from '../../planner/planner-pool.js';
import { previewJobPlan, previewPlan } from './plans.service.js';

export function previewPlanHandler(pool: PlannerPool) {
  return async (req: Request, res: Response): Promise<void> => {
    res.json({ data: await previewPlan(pool, req.body) });
  };
}

export function previewJobPlanHandler(pool: PlannerPool) {
  return async (req: Request, res: Response): Promise<void> => {
    res.json({ data: await previewJobPlan(pool, req.body) });
  };
}
