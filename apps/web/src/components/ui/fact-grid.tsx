import type { ReactNode } from 'react';

export interface Fact {
  label: string;
  value: ReactNode;
  testId?: string;
}

/** The short facts at the head of a customer's document (for whom, where, which, until when). */
export function FactGrid({ facts }: { facts: readonly Fact[] }) {
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-2 rounded-lg bg-sand-100 p-4 sm:grid-cols-2">
      {facts.map((fact) => (
        <div key={fact.label}>
          <dt className="font-semibold">{fact.label}</dt>
          <dd className="whitespace-pre-line" data-testid={fact.testId}>
            {fact.value}
          </dd>
        </div>
      ))}
    </dl>
  );
}
