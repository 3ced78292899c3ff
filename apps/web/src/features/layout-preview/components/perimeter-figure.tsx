import type { EdgeTag, LayoutPlan } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';
import { Figure } from '../../../components/plan/figure';

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
  const { length } = useUnits();
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
      note={byTag.map(({ words, feet }) => `${length(feet)} ${words}`).join(' · ')}
    >
      {length(plan.perimeterFt)}
    </Figure>
  );
}
