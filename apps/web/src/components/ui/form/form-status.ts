import { createContext, use } from 'react';

/** What the kit's fields and alert share with their Form. */
export interface FormStatus {
  /** The server's message for the top of the form, or null. */
  formError: string | null;
  /** A field announces its name while shown; the returned function takes it back. */
  registerField: (name: string) => () => void;
}

export const FormStatusContext = createContext<FormStatus | null>(null);

export function useFormStatus(): FormStatus {
  const status = use(FormStatusContext);
  if (!status) throw new Error('Form fields must be placed inside <Form>');
  return status;
}
