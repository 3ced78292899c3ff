import { rollHandlingCautions } from '@seamwright/takeoff';
import { CautionPanel } from '../../../components/ui/caution-panel';

interface RollCautionsProps {
  rolls: readonly { widthFt: number; lengthFt: number }[];
  className?: string;
}

/**
 * The heavy-roll caution for the rolls on screen (give each roll's length left: a used-down roll
 * is lighter); nothing at all when every roll is light enough for one person.
 */
export function RollCautions({ rolls, className }: RollCautionsProps) {
  const cautions = rollHandlingCautions(rolls);
  if (cautions.length === 0) return null;
  return (
    <div className={className}>
      {cautions.map((caution) => (
        <CautionPanel key={caution.key} title={caution.title} deferral={caution.deferral}>
          <p>{caution.body}</p>
          <p className="text-sm text-ink-muted">Source: {caution.reference}</p>
        </CautionPanel>
      ))}
    </div>
  );
}
