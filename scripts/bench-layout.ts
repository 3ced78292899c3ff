/**
 * bench-layout — prints how long the layout planner takes on a fixed set of sample yards,
 * with the grain given and with the direction left to the planner, and the turf ordered
 * against the area; then the job planner on sample jobs (several areas, rolls, remnants).
 * Usage: `pnpm bench:layout [--runs N]`. Read-only; safe anywhere.
 */
import { cpus } from 'node:os';
import { performance } from 'node:perf_hooks';
import {
  FACING_DEGREES,
  parseJobRequest,
  planJob,
  planLayout,
  sampleJobs,
  sampleYards,
} from '@seamwright/takeoff';
import type { JobPlan, LayoutPlan, LayoutRequestInput } from '@seamwright/takeoff';

const runsFlag = process.argv.indexOf('--runs');
const runs = runsFlag > 0 ? Number(process.argv[runsFlag + 1]) : 15;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] ?? NaN;
}

function time(request: LayoutRequestInput): { ms: number; plan: LayoutPlan } {
  let plan = planLayout(request);
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    plan = planLayout(request);
    times.push(performance.now() - start);
  }
  return { ms: median(times), plan };
}

const rows: string[] = [
  '| yard | vertices | area sq ft | grain 90°: ms | ordered | waste % | free: ms | grain | ordered | waste % | reuse |',
  '|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|',
];
// Warm the JIT on every yard first so the first row is not penalised.
for (const yard of sampleYards())
  planLayout({ area: { outer: yard.outer, holes: yard.holes }, roll: { widthFt: 15 } });
for (const yard of sampleYards()) {
  const base = {
    area: { outer: yard.outer, holes: yard.holes },
    roll: { widthFt: 15, maxLengthFt: 100 },
  };
  const fixed = time({ ...base, grain: { angleDeg: 90 } });
  const free = time(base);
  const vertices = yard.outer.length + yard.holes.reduce((sum, hole) => sum + hole.length, 0);
  rows.push(
    `| ${yard.name} | ${vertices} | ${free.plan.areaSqFt.toFixed(1)} | ${fixed.ms.toFixed(1)} | ${fixed.plan.orderedSqFt} | ` +
      `${fixed.plan.wastePct.toFixed(1)} | ${free.ms.toFixed(1)} | ${free.plan.grainAngleDeg}° | ${free.plan.orderedSqFt} | ` +
      `${free.plan.wastePct.toFixed(1)} | ${free.plan.offcutReuse ? 'yes' : 'no'} |`,
  );
}
console.log(
  `Layout planner benchmark — ${new Date().toISOString().slice(0, 10)}, ${cpus().length} cores, Node ${process.version}, median of ${runs} runs, 15 ft roll, 100 ft max length`,
);
console.log(rows.join('\n'));

// Job planner: several areas planned together (parsing included, as the command does).
function timeJob(request: unknown): { ms: number; plan: JobPlan } {
  let plan = planJob(parseJobRequest(request));
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    plan = planJob(parseJobRequest(request));
    times.push(performance.now() - start);
  }
  return { ms: median(times), plan };
}

/** The single-area planner on each area and roll of a job, for scale on a busy machine. */
function timeSingleAreas(request: Record<string, unknown>): number {
  const rolls = request.rolls as { widthFt: number }[];
  const areas = request.areas as {
    area: LayoutRequestInput['area'];
    grain?: { facing?: keyof typeof FACING_DEGREES };
  }[];
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    for (const area of areas)
      for (const roll of rolls)
        planLayout({
          area: area.area,
          roll,
          ...(area.grain?.facing ? { grain: { angleDeg: FACING_DEGREES[area.grain.facing] } } : {}),
        });
    times.push(performance.now() - start);
  }
  return median(times);
}

const jobRows: string[] = [
  '| job | areas | vertices | remnants | ms | single-area planner on its areas × rolls: ms | ordered | planned alone | remnant sq ft used | shared |',
  '|---|---:|---:|---:|---:|---:|---:|---:|---:|---|',
];
for (const job of sampleJobs()) {
  const { ms, plan } = timeJob(job.request);
  const singleMs = timeSingleAreas(job.request);
  const areas = job.request.areas as { area: { outer: unknown[] } }[];
  const vertices = areas.reduce((sum, area) => sum + area.area.outer.length, 0);
  const remnants = (job.request.remnants as unknown[] | undefined)?.length ?? 0;
  const alone = plan.alternatives.find((a) => a.kind === 'areas-alone')?.orderedSqFt ?? NaN;
  jobRows.push(
    `| ${job.name} | ${areas.length} | ${vertices} | ${remnants} | ${ms.toFixed(1)} | ${singleMs.toFixed(1)} | ${plan.orderedSqFt} | ${alone} | ` +
      `${plan.remnantSqFtUsed} | ${plan.shared ? 'yes' : 'no'} |`,
  );
}
console.log('');
console.log(
  `Job planner benchmark — median of ${runs} runs (parsing included); the single-area column times planLayout alone on the same areas and rolls (a facing at its centre), for scale`,
);
console.log(jobRows.join('\n'));
