import { grainArrow } from '../layout/cut-sheet.js';
import { roundFt, roundSqFt } from '../layout/rounding.js';
import type { LayoutCut } from '../layout/types.js';
import type { AreaCandidate } from './area-candidates.js';
import type { JobEvaluation } from './evaluate-job.js';
import { costOf } from './job-rank.js';
import type { JobPlacement } from './pack-job.js';
import type {
  JobAreaPlan,
  JobCut,
  JobCutSheetEntry,
  JobPiece,
  JobPlan,
  JobRequest,
  RollChoice,
} from './types.js';

function jobCut(cut: LayoutCut, placement: JobPlacement, reversed: boolean): JobCut {
  const [a, b, c, d] = cut.corners;
  return {
    piece: placement.piece,
    alongFt: cut.alongFt,
    acrossFt: cut.acrossFt,
    // A grain opposite to the plan's: the start is the other end and left the other side.
    corners: reversed ? [c, d, a, b] : [a, b, c, d],
    strip: cut.strip,
    acrossOffsetFt: roundFt(placement.acrossOffsetFt),
    alongOffsetFt: roundFt(placement.alongOffsetFt),
  };
}

function grainSource(job: JobRequest, area: number): JobAreaPlan['grainSource'] {
  const kind = job.areas[area]?.grain.kind;
  return kind === 'angle' ? 'given' : kind === 'facing' ? 'facing' : 'planner';
}

function piecesOf(evaluation: JobEvaluation, job: JobRequest): JobPiece[] {
  return evaluation.packing.pieces.map((piece): JobPiece => {
    if (piece.kind === 'new')
      return { widthFt: piece.widthFt, lengthFt: roundFt(piece.lengthFt), source: 'new' };
    const remnant = job.remnants[piece.remnant];
    return {
      widthFt: remnant?.widthFt ?? 0,
      lengthFt: remnant?.lengthFt ?? 0,
      source: 'remnant',
      remnantId: remnant?.id ?? '',
    };
  });
}

function cutSheetOf(
  pieces: readonly JobPiece[],
  areas: readonly JobAreaPlan[],
  candidates: readonly AreaCandidate[],
): JobCutSheetEntry[] {
  return pieces.map((piece, index) => ({
    piece: index,
    source: piece.source,
    ...(piece.remnantId !== undefined ? { remnantId: piece.remnantId } : {}),
    widthFt: piece.widthFt,
    lengthFt: piece.lengthFt,
    cuts: areas.flatMap((area, a) =>
      area.cuts.flatMap((cut, c) => {
        if (cut.piece !== index) return [];
        const candidate = candidates[a] as AreaCandidate;
        const sheet = candidate.plan.cutSheet
          .flatMap((entry) => entry.cuts)
          .find((x) => x.cut === c);
        return [
          {
            area: area.id,
            cut: c,
            acrossFromFt: cut.acrossOffsetFt,
            acrossToFt: roundFt(cut.acrossOffsetFt + cut.acrossFt),
            alongFromFt: cut.alongOffsetFt,
            alongToFt: roundFt(cut.alongOffsetFt + cut.alongFt),
            goes: `${area.id}: ${sheet?.goes ?? ''}`,
            grainArrow: grainArrow(area.grainAngleDeg),
          },
        ];
      }),
    ),
  }));
}

/** Builds the job plan from the chosen evaluation (pieces, per-area cuts, cut sheet, cost). */
export function assemblePlan(
  job: JobRequest,
  evaluation: JobEvaluation,
  choicesFor: (area: number) => RollChoice[],
  alternatives: JobPlan['alternatives'],
): JobPlan {
  const pieces = piecesOf(evaluation, job);
  let next = 0;
  const areas = evaluation.candidates.map((candidate, a): JobAreaPlan => {
    const { plan } = candidate;
    const cuts = plan.cuts.map((cut) =>
      jobCut(cut, evaluation.packing.placements[next++] as JobPlacement, candidate.reversed),
    );
    return {
      id: job.areas[a]?.id ?? String(a),
      areaSqFt: plan.areaSqFt,
      grainAngleDeg: candidate.grainAngleDeg,
      grainSource: grainSource(job, a),
      rollWidthFt: candidate.rollWidthFt,
      cuts,
      seams: plan.seams,
      seamLines: plan.seamLines,
      perimeterFt: plan.perimeterFt,
      perimeterByTagFt: plan.perimeterByTagFt,
      trafficSeamCrossings: plan.trafficSeamCrossings,
      aloneOrderedSqFt: plan.orderedSqFt,
      rollChoices: choicesFor(a),
    };
  });
  const remnantSqFtUsed = areas.reduce(
    (sum, area) =>
      sum +
      area.cuts
        .filter((cut) => pieces[cut.piece]?.source === 'remnant')
        .reduce((s, cut) => s + cut.acrossFt * cut.alongFt, 0),
    0,
  );
  const { figures } = evaluation;
  return {
    orderedSqFt: roundSqFt(figures.orderedSqFt),
    areaSqFt: roundSqFt(areas.reduce((sum, area) => sum + area.areaSqFt, 0)),
    remnantSqFtUsed: roundSqFt(remnantSqFtUsed),
    pieces,
    areas,
    seams: {
      count: figures.seams.count,
      sideFt: roundFt(figures.seams.sideFt),
      buttFt: roundFt(figures.seams.buttFt),
    },
    ...(job.costs ? { cost: costOf(figures, job.costs) } : {}),
    shared: !evaluation.alone,
    cutSheet: cutSheetOf(pieces, areas, evaluation.candidates),
    alternatives,
  };
}
