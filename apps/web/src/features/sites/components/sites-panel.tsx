import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ShowMore } from '../../../components/ui/show-more';
import { useToast } from '../../../components/ui/toast';
import { largestPageSize } from '../../../lib/paged-list';
import { useSites } from '../api/get-sites';
import { useCreateSite } from '../api/create-site';
import { SiteCard, siteHeadingId } from './site-card';
import { SiteForm } from './site-form';

/** After a delete: the site that followed the deleted one, or the list's heading if it was last. */
function focusAfterDeleting(nextSiteId: string | undefined): HTMLElement | null {
  const next = nextSiteId ? document.getElementById(siteHeadingId(nextSiteId)) : null;
  return next ?? document.getElementById('sites-heading');
}

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
        <h2 id="sites-heading" tabIndex={-1} className="text-xl font-bold">
          Sites{' '}
          <span className="tabular-nums font-normal text-ink-muted">
            ({sites.total.toLocaleString('en-US')})
          </span>
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
      {sites.total === 0 && !isAdding ? (
        <EmptyState title="No sites yet">
          A site is the address where the turf goes, with what the crew needs to know: the gate, the
          dog, the slope.
          {canWrite ? ' Add one to start measuring.' : ''}
        </EmptyState>
      ) : (
        <>
          <ul className="flex flex-col gap-3" aria-label="Sites">
            {sites.items.map((site, index) => (
              <SiteCard
                key={site.id}
                site={site}
                canWrite={canWrite}
                focusAfterDelete={() => focusAfterDeleting(sites.items[index + 1]?.id)}
                onDeleted={onSitesChanged}
              />
            ))}
          </ul>
          <ShowMore
            shown={sites.items.length}
            total={sites.total}
            noun="sites"
            pageSize={largestPageSize}
            hasMore={sites.hasMore}
            isLoading={sites.isLoadingMore}
            onShowMore={sites.loadMore}
          />
        </>
      )}
    </section>
  );
}
