export { cautionContextForTakeoff, cautionsFor } from './cautions-for.js';
export type { CautionContext } from './cautions-for.js';
export { DEFER_TO_LOCAL_PRACTICE } from './caution-texts.js';
export type { Caution } from './caution-texts.js';
