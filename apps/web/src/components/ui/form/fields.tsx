import {
  useEffect,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';
import {
  get,
  useFormContext,
  useFormState,
  type FieldError,
  type RegisterOptions,
} from 'react-hook-form';
import {
  SelectField as SelectControl,
  TextAreaField as TextAreaControl,
  TextField as TextControl,
} from '../form-fields';
import { useFormStatus } from './form-status';

/** What every kit field takes: the schema's field name, a label and an optional hint. */
export interface FieldProps {
  name: string;
  label: string;
  hint?: ReactNode;
  wrapperClassName?: string;
}

/**
 * Binds a field to the surrounding Form: its registration, its message (from the schema as
 * the person types, or from the server after a submit) and its place in the server-error list.
 */
export function useBoundField(name: string, options?: RegisterOptions) {
  const { register, control } = useFormContext();
  const { registerField } = useFormStatus();
  useEffect(() => registerField(name), [name, registerField]);
  const { errors } = useFormState({ control, name });
  // `get` reads nested names such as `address.city`; errors hold FieldError leaves.
  const error = get<typeof errors, FieldError | undefined>(errors, name)?.message;
  return { registration: register(name, options), error };
}

type Native<T> = Omit<T, 'name' | 'defaultValue' | 'value' | 'onChange' | 'onBlur'>;

export function TextField({
  name,
  registerOptions,
  ...rest
}: FieldProps &
  Native<InputHTMLAttributes<HTMLInputElement>> & { registerOptions?: RegisterOptions }) {
  const { registration, error } = useBoundField(name, registerOptions);
  return <TextControl {...rest} {...registration} error={error} />;
}

export function TextAreaField({
  name,
  ...rest
}: FieldProps & Native<TextareaHTMLAttributes<HTMLTextAreaElement>>) {
  const { registration, error } = useBoundField(name);
  return <TextAreaControl {...rest} {...registration} error={error} />;
}

export function SelectField({
  name,
  children,
  ...rest
}: FieldProps & Native<SelectHTMLAttributes<HTMLSelectElement>>) {
  const { registration, error } = useBoundField(name);
  return (
    <SelectControl {...rest} {...registration} error={error}>
      {children}
    </SelectControl>
  );
}
