import { useCallback, useMemo, useRef, type FormHTMLAttributes, type ReactNode } from 'react';
import {
  FormProvider,
  useForm,
  type DefaultValues,
  type FieldValues,
  type Mode,
  type Resolver,
  type UseFormReturn,
} from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { useServerSubmit } from '../../../lib/form-errors';
import { cn } from '../cn';
import { FormStatusContext, type FormStatus } from './form-status';
import { FormAlert } from './form-alert';

/** Any zod schema whose input and output are objects of field values. */
export type FormSchema = z.ZodType<FieldValues, FieldValues>;

/** The react-hook-form methods of a form built from `S`. */
export type FormMethods<S extends FormSchema> = UseFormReturn<z.input<S>, unknown, z.output<S>>;

interface FormProps<S extends FormSchema> extends Omit<
  FormHTMLAttributes<HTMLFormElement>,
  'onSubmit' | 'children' | 'defaultValue'
> {
  /** Checked as the person types (see `mode`) and before every submit; usually a shared schema. */
  schema: S;
  defaultValues: DefaultValues<z.input<S>>;
  /** `onChange` checks each keystroke; `onTouched` waits until a field was left once. */
  mode?: Mode;
  /** Gets the parsed values; a thrown ApiError's field errors land beside the fields. */
  onSubmit: (values: z.output<S>, methods: FormMethods<S>) => Promise<unknown> | void;
  children: ReactNode;
}

/**
 * A form as a list of fields: give it a zod schema, default values and a submit action, and put
 * kit fields (TextField, SelectField, …) inside by name. Validation, the server's errors beside
 * their fields, the form-level alert at the top and the busy submit button are handled here.
 */
export function Form<S extends FormSchema>({
  schema,
  defaultValues,
  mode = 'onChange',
  onSubmit,
  className,
  children,
  ...rest
}: FormProps<S>) {
  const methods = useForm<z.input<S>, unknown, z.output<S>>({
    // zodResolver's overloads cannot be picked for a generic S; the casts only restate its types.
    resolver: zodResolver(schema as unknown as z.ZodObject) as unknown as Resolver<
      z.input<S>,
      unknown,
      z.output<S>
    >,
    mode,
    defaultValues,
  });

  // The names of the fields this form shows, so a server error for a field that is not on the
  // screen goes to the alert at the top instead of vanishing.
  const shownFields = useRef(new Set<string>());
  const registerField = useCallback((name: string) => {
    shownFields.current.add(name);
    return () => {
      shownFields.current.delete(name);
    };
  }, []);

  const { submit, formError } = useServerSubmit(
    methods,
    () => [...shownFields.current],
    (values) => Promise.resolve(onSubmit(values, methods)),
  );
  const status = useMemo<FormStatus>(
    () => ({ formError, registerField }),
    [formError, registerField],
  );

  return (
    <FormProvider {...methods}>
      <FormStatusContext value={status}>
        <form
          onSubmit={submit}
          noValidate
          className={cn('flex flex-col gap-4', className)}
          {...rest}
        >
          <FormAlert />
          {children}
        </form>
      </FormStatusContext>
    </FormProvider>
  );
}
