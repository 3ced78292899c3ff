// Public surface of the layout planner (re-exported by the package index).
export { planLayout } from './plan-layout.js';
export { LAYOUT_ENGINE_VERSION } from './engine-version.js';
export {
  parseLayoutRequest,
  DEFAULT_MAX_LENGTH_FT,
  DEFAULT_WALKWAY_WIDTH_FT,
} from './parse-request.js';
export {
  checkLayoutRequestSize,
  MAX_COORDINATE_FT,
  MAX_HOLES,
  MAX_PIECES_PER_STRIP,
  MAX_RING_POINTS,
  MAX_STRIPS,
  MAX_TOTAL_VERTICES,
  MAX_TRAFFIC_PATH_POINTS,
  MAX_TRAFFIC_PATHS,
  MIN_LENGTH_STEP_FT,
} from './limits.js';
export { LayoutInputError } from './errors.js';
export { EDGE_TAGS as LAYOUT_EDGE_TAGS } from './types.js';
export type {
  CutSheetCut,
  CutSheetEntry,
  EdgeTag,
  GrainArrow,
  LayoutAlternative,
  LayoutCut,
  LayoutPiece,
  LayoutPlan,
  LayoutRequest,
  LayoutRequestInput,
  Point as LayoutPoint,
  SeamLine,
  TrafficPath,
  TrafficSeamCrossing,
} from './types.js';
export {
  sampleYards,
  beanYard,
  irregularYard,
  seededRandom,
  contractExampleRequest,
} from './sample-yards.js';
export type { SampleYard } from './sample-yards.js';
