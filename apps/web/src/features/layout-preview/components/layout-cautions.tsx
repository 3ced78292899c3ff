import type { Caution } from '@seamwright/takeoff';
import { CautionPanel } from '../../../components/ui/caution-panel';

/** The safety cautions for this usage, each in the shared caution panel with its source. */
export function LayoutCautions({ cautions }: { cautions: readonly Caution[] }) {
  return (
    <div className="grid gap-4 md:grid-cols-2">
      {cautions.map((caution) => (
        <CautionPanel key={caution.key} title={caution.title} deferral={caution.deferral}>
          <p>{caution.body}</p>
          <p className="text-sm text-ink-muted">Source: {caution.reference}</p>
        </CautionPanel>
      ))}
    </div>
  );
}
