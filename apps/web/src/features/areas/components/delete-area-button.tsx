import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { FormAlert } from '../../../components/ui/form-alert';
import type { Area } from '../api/area-types';
import { useDeleteArea } from '../api/delete-area';

/** Removes the area and its plan after asking once; the job's takeoff follows. */
export function DeleteAreaButton({ area, onDeleted }: { area: Area; onDeleted: () => void }) {
  const [isOpen, setOpen] = useState(false);
  const remove = useDeleteArea(area.jobId);
  return (
    <>
      <Button variant="quietDanger" onClick={() => setOpen(true)}>
        Delete area
      </Button>
      {remove.isError ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <ConfirmDialog
        isOpen={isOpen}
        title={`Delete ${area.name}?`}
        confirmLabel="Delete area"
        isBusy={remove.isPending}
        onCancel={() => setOpen(false)}
        onConfirm={() =>
          remove.mutate(area.id, {
            onSuccess: onDeleted,
            onSettled: () => setOpen(false),
          })
        }
      >
        Its drawing, plan and cut sheet go, and the job’s takeoff no longer counts it.
      </ConfirmDialog>
    </>
  );
}
