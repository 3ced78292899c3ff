// What other modules read about a job's areas: the takeoff over all of them (estimates price
// it) and the saved plan pieces per turf product (stock reserves rolls for them). Both read
// through the request context only, so any service may call them.
import {
  cautionContextForTakeoff,
  cautionsFor,
  computeTakeoff,
  defaultTakeoffSettings,
} from '@seamwright/takeoff';
import type { Caution, TakeoffInput, TakeoffLine, TakeoffSettings } from '@seamwright/takeoff';
import type { JobTakeoffView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { notFound } from '../../errors.js';
import { findEstimatingSettings } from '../estimating-settings/estimating-settings.repository.js';
import { effectiveTakeoffSettings } from '../estimating-settings/takeoff-overrides.js';
import { findJob } from '../jobs/jobs.repository.js';
import { listAreasOfJob } from './areas.repository.js';
import type { AreaRecord } from './areas.repository.js';
import { mergeCautions, mergeTakeoffLines } from './takeoff-merge.js';

/** The takeoff's view of a saved area: its plan's figures, usage, turf and base depth. */
export function takeoffInputOfArea(area: AreaRecord): TakeoffInput {
  const { plan } = area;
  // 'unknown' is the rest of the perimeter to the takeoff; only tagged edges are passed.
  const tagged = Object.fromEntries(
    Object.entries(plan.perimeterByTagFt).filter(([tag]) => tag !== 'unknown'),
  );
  const taggedFt = Object.values(tagged).reduce((sum, ft) => sum + (ft ?? 0), 0);
  return {
    usage: area.usage,
    areaSqFt: plan.areaSqFt,
    // The plan rounds the total and the tags separately; never let the tags exceed it.
    perimeterFt: Math.max(plan.perimeterFt, taggedFt),
    perimeterByTagFt: tagged,
    seams: { sideFt: plan.seams.sideFt, buttFt: plan.seams.buttFt, count: plan.seams.count },
    turf: {
      orderedSqFt: plan.orderedSqFt,
      pieces: plan.pieces.map(({ widthFt, lengthFt }) => ({ widthFt, lengthFt })),
      ...(area.turfProduct ? { pileHeightIn: area.turfProduct.pileHeightIn } : {}),
    },
    ...(area.baseDepthIn === null ? {} : { baseDepthIn: area.baseDepthIn }),
  };
}

/** The company's effective takeoff settings (defaults with its overrides laid over them). */
async function companyTakeoffSettings(ctx: RequestContext): Promise<TakeoffSettings> {
  const row = await findEstimatingSettings(ctx);
  if (!row) return defaultTakeoffSettings;
  // Saved overrides passed this check when written; the standard stands in should a later,
  // stricter schema refuse an old value (as the settings screen does).
  return effectiveTakeoffSettings(row.takeoffOverrides).settings ?? defaultTakeoffSettings;
}

async function jobAreas(ctx: RequestContext, jobId: string) {
  const [job, areas] = await Promise.all([findJob(ctx, jobId), listAreasOfJob(ctx, jobId)]);
  if (!job) throw notFound('Job');
  return areas;
}

/**
 * The material takeoff of a job: `computeTakeoff` (packages/takeoff) for each saved area with
 * the company's effective estimating settings, added up per line (see takeoff-merge.ts), and
 * the safety cautions per area and for the whole job. A job without areas has no lines. 404
 * for another company's job.
 */
export async function getJobTakeoff(ctx: RequestContext, jobId: string): Promise<JobTakeoffView> {
  const [areas, settings] = await Promise.all([jobAreas(ctx, jobId), companyTakeoffSettings(ctx)]);
  return takeoffOf(jobId, areas, settings);
}

/**
 * The same takeoff over areas the caller has already read (of a job it has already checked),
 * so a caller that also needs the areas themselves reads them once.
 */
export async function getTakeoffOfAreas(
  ctx: RequestContext,
  jobId: string,
  areas: readonly AreaRecord[],
): Promise<JobTakeoffView> {
  return takeoffOf(jobId, areas, await companyTakeoffSettings(ctx));
}

function takeoffOf(
  jobId: string,
  areas: readonly AreaRecord[],
  settings: TakeoffSettings,
): JobTakeoffView {
  const perArea = areas.map((area) => {
    const input = takeoffInputOfArea(area);
    const lines: TakeoffLine[] = computeTakeoff(input, settings);
    const cautions: Caution[] = cautionsFor(cautionContextForTakeoff(input, lines, settings));
    return { area, lines, cautions };
  });
  return {
    jobId,
    lines: mergeTakeoffLines(
      perArea.map(({ area, lines }) => ({
        areaId: area.id,
        areaName: area.name,
        turfProductId: area.turfProductId,
        lines,
      })),
    ),
    areas: perArea.map(({ area, cautions }) => ({
      id: area.id,
      name: area.name,
      usage: area.usage,
      cautions: mergeCautions([cautions]),
    })),
    cautions: mergeCautions(perArea.map(({ cautions }) => cautions)),
  };
}

/** One piece to buy for an area, as its saved plan has it. */
export interface JobTurfPiece {
  areaId: string;
  areaName: string;
  /** Index into the area's `plan.pieces`. */
  piece: number;
  widthFt: number;
  lengthFt: number;
}

/** The pieces of one turf product over the job (`turfProductId` null: no product chosen). */
export interface JobTurfPieces {
  turfProductId: string | null;
  turfProductName: string | null;
  orderedSqFt: number;
  pieces: JobTurfPiece[];
}

/**
 * The pieces the job's saved plans buy, grouped by turf product, areas in the order they were
 * drawn and pieces in plan order (for reserving rolls of one dye lot). 404 for another
 * company's job.
 */
export async function listJobTurfPieces(
  ctx: RequestContext,
  jobId: string,
): Promise<JobTurfPieces[]> {
  const groups = new Map<string | null, JobTurfPieces>();
  for (const area of await jobAreas(ctx, jobId)) {
    const key = area.turfProductId;
    const group = groups.get(key) ?? {
      turfProductId: key,
      turfProductName: area.turfProduct?.name ?? null,
      orderedSqFt: 0,
      pieces: [],
    };
    area.plan.pieces.forEach(({ widthFt, lengthFt }, piece) => {
      group.pieces.push({ areaId: area.id, areaName: area.name, piece, widthFt, lengthFt });
      group.orderedSqFt = Math.round((group.orderedSqFt + widthFt * lengthFt) * 1e6) / 1e6;
    });
    groups.set(key, group);
  }
  return [...groups.values()];
}
