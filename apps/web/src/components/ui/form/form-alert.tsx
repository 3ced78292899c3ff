import { useFormState } from 'react-hook-form';
import { Button } from '../button';
import { FormAlert as AlertBox } from '../form-alert';
import { useFormStatus } from './form-status';

/** The server's form-level message (what could not be put beside a field); Form places it on top. */
export function FormAlert() {
  return <AlertBox>{useFormStatus().formError}</AlertBox>;
}

/** The form's submit button: busy, and with `busyLabel` if given, while the submit runs. */
export function SubmitButton({ children, busyLabel }: { children: string; busyLabel?: string }) {
  const { isSubmitting } = useFormState();
  return (
    <Button type="submit" isBusy={isSubmitting}>
      {isSubmitting && busyLabel ? busyLabel : children}
    </Button>
  );
}
