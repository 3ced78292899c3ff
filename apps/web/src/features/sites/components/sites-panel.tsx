import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { useToast } from '../../../components/ui/toast';
import { useSites } from '../api/get-sites';
import { useCreateSite } from '../api/create-site';
import { SiteCard } from './site-card';
import { SiteForm } from './site-form';

interface SitesPanelProps {
  customerId: string;
  canWrite: boolean;
  /** Called after a site is added or deleted, for the route to refresh other features' data. */
  onSitesChanged: () => Promise<unknown>;
}

/** A customer's sites: the list and the "Add a site" form. */
export function SitesPanel({ customerId, canWrite, onSitesChanged }: SitesPanelProps) {
  const sites = useSites(customerId);
  const create = useCreateSite(customerId, onSitesChanged);
  const toast = useToast();
  const [isAdding, setIsAdding] = useState(false);

  return (
    <section aria-labelledby="sites-heading" className="mt-8">
      <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
        <h2 id="sites-heading" className="text-xl font-bold">
          Sites <span className="tabular-nums font-normal text-ink-muted">({sites.length})</span>
        </h2>
        {canWrite && !isAdding ? (
          <Button onClick={() => setIsAdding(true)} className="print:hidden">
            Add a site
          </Button>
        ) : null}
      </div>
      {isAdding ? (
        <div className="mb-4 rounded-lg border border-moss-200 bg-white p-5">
          <h3 className="mb-4 text-lg font-bold">New site</h3>
          <SiteForm
            submitLabel="Save site"
            onCancel={() => setIsAdding(false)}
            onSubmit={async (values) => {
              await create.mutateAsync(values);
              setIsAdding(false);
              toast.show('Site added.');
            }}
          />
        </div>
      ) : null}
      {sites.length === 0 && !isAdding ? (
        <EmptyState title="No sites yet">
          A site is the address where the turf goes, with what the crew needs to know: the gate, the
          dog, the slope.
          {canWrite ? ' Add one to start measuring.' : ''}
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-3">
          {sites.map((site) => (
            <SiteCard key={site.id} site={site} canWrite={canWrite} onDeleted={onSitesChanged} />
          ))}
        </ul>
      )}
    </section>
  );
}
