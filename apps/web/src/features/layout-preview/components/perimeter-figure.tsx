import { formatNumber } from '@seamwright/takeoff';
import type { LayoutPlan } from '@seamwright/takeoff';
import { Figure } from './figure';

const tagWords: Record<string, string> = {
  hard: 'against hard surfaces',
  bed: 'against beds',
  lawn: 'against lawn',
  fence: 'along fences',
  house: 'along the house',
  unknown: 'not tagged yet',
};

/** Total perimeter, and its feet by what each edge meets (edge tags come with the area editor). */
export function PerimeterFigure({ plan }: { plan: LayoutPlan }) {
  const byTag = Object.entries(plan.perimeterByTagFt).filter(
    ([, feet]) => feet !== undefined && feet > 0,
  );
  return (
    <Figure
      term="Perimeter"
      note={byTag
        .map(([tag, feet]) => `${formatNumber(feet ?? 0, 1)} ft ${tagWords[tag] ?? tag}`)
        .join(' · ')}
    >
      {formatNumber(plan.perimeterFt, 1)} ft
    </Figure>
  );
}
