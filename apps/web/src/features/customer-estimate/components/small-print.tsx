import type { PublicEstimateView } from '@seamwright/shared';
import { CautionPanel } from '../../../components/ui/caution-panel';

/** The company's notes, the safety cautions and the rounding sentence. */
export function NotesAndCautions({ view }: { view: PublicEstimateView }) {
  return (
    <>
      {view.notes ? (
        <section aria-labelledby="notes-heading">
          <h2 id="notes-heading" className="text-2xl font-bold">
            Notes from {view.company.name}
          </h2>
          <p className="mt-2 whitespace-pre-line">{view.notes}</p>
        </section>
      ) : null}
      {view.cautions.length > 0 ? (
        <section aria-labelledby="cautions-heading" className="flex flex-col gap-4">
          <h2 id="cautions-heading" className="text-2xl font-bold">
            Good to know
          </h2>
          {view.cautions.map((caution) => (
            <CautionPanel key={caution.title} title={caution.title}>
              <p>{caution.text}</p>
            </CautionPanel>
          ))}
        </section>
      ) : null}
      <p className="text-sm text-ink-muted" data-testid="rounding-rule">
        {view.roundingRule}
      </p>
    </>
  );
}

/** The notice of the right to cancel, when accepting this estimate is covered by one. */
export function CancellationNotice({
  notice,
}: {
  notice: PublicEstimateView['cancellation']['notice'];
}) {
  if (!notice) return null;
  return (
    <section
      aria-labelledby="cancel-heading"
      className="rounded-lg border-2 border-ink bg-white p-4 sm:p-6"
    >
      <h2 id="cancel-heading" className="text-xl font-bold">
        {notice.heading}
      </h2>
      <p className="mt-2 font-semibold">{notice.statement}</p>
      {notice.paragraphs.map((text, index) => (
        <p key={index} className="mt-2">
          {text}
        </p>
      ))}
      <p className="mt-2 font-semibold">{notice.endsOnText}</p>
      {notice.formLines.length > 0 ? (
        <div className="mt-3 border-t border-line pt-3 text-sm">
          {notice.formLines.map((line, index) => (
            <p key={index}>{line}</p>
          ))}
        </div>
      ) : null}
    </section>
  );
}
