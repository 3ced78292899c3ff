import { useState } from 'react';
import type { SiteView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { describeError } from '../../../components/ui/region-error';
import { useToast } from '../../../components/ui/toast';
import { useFocusWhenShown } from '../../../lib/focus-when-shown';
import { useUpdateSite } from '../api/update-site';
import { useDeleteSite } from '../api/delete-site';
import { SiteForm } from './site-form';

function Line({ label, value }: { label: string; value: string | null }) {
  if (!value) return null;
  return (
    <div>
      <dt className="text-sm font-semibold text-ink-muted">{label}</dt>
      <dd className="whitespace-pre-line">{value}</dd>
    </div>
  );
}

/** One site: where it is, what the crew must know, and edit/delete for those who may. */
export function siteHeadingId(siteId: string): string {
  return `site-${siteId}-heading`;
}

interface SiteCardProps {
  site: SiteView;
  canWrite: boolean;
  /** Where focus goes after this site is deleted: the next site or the list's heading. */
  focusAfterDelete: () => HTMLElement | null;
  /** Called after the site is deleted (see `SitesPanel`'s `onSitesChanged`). */
  onDeleted: () => Promise<unknown>;
}

export function SiteCard({ site, canWrite, focusAfterDelete, onDeleted }: SiteCardProps) {
  const [isEditing, setIsEditing] = useState(false);
  const [isConfirming, setIsConfirming] = useState(false);
  const update = useUpdateSite(site.customerId, site.id);
  const remove = useDeleteSite(site.customerId, site.id, onDeleted);
  const toast = useToast();
  const title = site.label ?? site.addressLine1;
  const { target: editButtonRef, request: focusEditButton } =
    useFocusWhenShown<HTMLButtonElement>();
  const { target: formHeadingRef, request: focusFormHeading } =
    useFocusWhenShown<HTMLHeadingElement>();
  const stopEditing = () => {
    focusEditButton();
    setIsEditing(false);
  };

  if (isEditing) {
    return (
      <li className="rounded-lg border border-line bg-white p-5">
        <h3 ref={formHeadingRef} tabIndex={-1} className="mb-4 text-lg font-bold">
          Edit site
        </h3>
        <SiteForm
          site={site}
          submitLabel="Save site"
          onCancel={stopEditing}
          onSubmit={async (values) => {
            await update.mutateAsync(values);
            stopEditing();
            toast.show('Site saved.');
          }}
        />
      </li>
    );
  }

  const place = [site.city, site.region, site.postalCode].filter(Boolean).join(', ');
  return (
    <li className="rounded-lg border border-line bg-white p-5">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h3 id={siteHeadingId(site.id)} tabIndex={-1} className="text-lg font-bold">
            {title}
          </h3>
          <address className="not-italic text-ink-muted">
            {site.addressLine1}
            {site.addressLine2 ? `, ${site.addressLine2}` : ''}
            <br />
            {place}
          </address>
        </div>
        {canWrite ? (
          <div className="flex gap-2 print:hidden">
            <Button
              variant="secondary"
              ref={editButtonRef}
              onClick={() => {
                focusFormHeading();
                setIsEditing(true);
              }}
              aria-label={`Edit site ${title}`}
            >
              Edit
            </Button>
            <Button
              variant="quietDanger"
              onClick={() => setIsConfirming(true)}
              aria-label={`Delete site ${title}`}
            >
              Delete
            </Button>
          </div>
        ) : null}
      </div>
      <dl className="mt-3 grid gap-3 sm:grid-cols-2">
        <Line label="Access and gate" value={site.accessNotes} />
        <Line label="Pets" value={site.pets} />
        <Line label="Hazards" value={site.hazards} />
        <div>
          <dt className="text-sm font-semibold text-ink-muted">Sprinkler heads to cap</dt>
          <dd className="tabular-nums">
            {site.sprinklerHeads === null
              ? 'Not counted yet'
              : `${site.sprinklerHeads} ${site.sprinklerHeads === 1 ? 'head' : 'heads'}`}
          </dd>
        </div>
      </dl>
      <ConfirmDialog
        isOpen={isConfirming}
        title={`Delete the site ${title}?`}
        confirmLabel="Delete site"
        isBusy={remove.isPending}
        fallbackFocus={focusAfterDelete}
        onCancel={() => setIsConfirming(false)}
        onConfirm={() =>
          void remove.mutateAsync().then(
            () => {
              setIsConfirming(false);
              toast.show('Site deleted.');
            },
            (error: unknown) => {
              setIsConfirming(false);
              toast.show(describeError(error).detail);
            },
          )
        }
      >
        The address and its notes are removed for good.
      </ConfirmDialog>
    </li>
  );
}
