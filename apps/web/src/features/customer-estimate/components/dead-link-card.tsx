import { PublicCard } from '../../../components/ui/public-card';
import { deadLinkWords, type DeadLink } from '../utils/answer-state';

/** An estimate link the page cannot use, said in words (never a status code). */
export function DeadLinkCard({ dead }: { dead: DeadLink }) {
  const words = deadLinkWords[dead];
  return (
    <PublicCard title={words.title}>
      <p data-testid="dead-link" data-kind={dead}>
        {words.text}
      </p>
    </PublicCard>
  );
}
