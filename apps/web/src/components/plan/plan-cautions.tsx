import { CautionPanel } from '../ui/caution-panel';

/** A caution as the takeoff gives it (packages/takeoff cautions, or the API's CautionView). */
export interface PlanCaution {
  key: string;
  title: string;
  body: string;
  deferral: string;
  reference: string;
}

/** The safety cautions for this usage, each in the shared caution panel with its source. */
export function PlanCautions({ cautions }: { cautions: readonly PlanCaution[] }) {
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
