import { formatNumber } from '@seamwright/takeoff';
import type { EdgeTag, LayoutPlan } from '@seamwright/takeoff';
import { Figure } from './figure';

const tagWords: Record<EdgeTag | 'unknown', string> = {
  hard: 'against hard surfaces',
  bed: 'against beds',
  lawn: 'against lawn',
  fence: 'along fences',
  house: 'along the house',
  unknown: 'not tagged yet',
};

/** Total perimeter, and its feet by what each edge meets (chosen under “What does each edge meet?”). */
export function PerimeterFigure({ plan }: { plan: LayoutPlan }) {
  // In tagWords' order, so tagged feet come first and the untagged rest last.
  const byTag = Object.entries(tagWords)
    .map(([tag, words]) => ({
      words,
      // Object.entries types keys as string; tagWords' keys are exactly the tags.
      feet: plan.perimeterByTagFt[tag as EdgeTag | 'unknown'] ?? 0,
    }))
    .filter(({ feet }) => feet > 0);
  return (
    <Figure
      term="Perimeter"
      note={byTag.map(({ words, feet }) => `${formatNumber(feet, 1)} ft ${words}`).join(' · ')}
    >
      {formatNumber(plan.perimeterFt, 1)} ft
    </Figure>
  );
}
