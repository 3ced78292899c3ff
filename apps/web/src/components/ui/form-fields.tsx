import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type Ref,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';
import { cn } from './cn';

const controlClasses =
  'block w-full rounded-md border border-line-strong bg-white px-3 py-2 text-base text-ink min-h-11 ' +
  'aria-[invalid=true]:border-brick-700 aria-[invalid=true]:bg-brick-50';

interface FieldShellProps {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}

/** Label, control, hint and error message, wired together for screen readers. */
function FieldShell({ id, label, hint, error, children, className }: FieldShellProps) {
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {children}
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-sm font-semibold text-brick-700" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}

function describedBy(id: string, hint: unknown, error: string | undefined): string | undefined {
  if (error) return `${id}-error`;
  return hint ? `${id}-hint` : undefined;
}

interface CommonProps {
  label: string;
  hint?: ReactNode;
  error?: string;
  wrapperClassName?: string;
}

/** The id, class and ARIA wiring every control shares, so the three field kinds stay alike. */
function useControlProps(
  id: string | undefined,
  hint: unknown,
  error: string | undefined,
  className?: string,
) {
  const fallbackId = useId();
  const fieldId = id ?? fallbackId;
  return {
    id: fieldId,
    className: cn(controlClasses, className),
    'aria-invalid': error ? true : undefined,
    'aria-describedby': describedBy(fieldId, hint, error),
  } as const;
}

export function TextField({
  label,
  hint,
  error,
  wrapperClassName,
  id,
  className,
  ref,
  ...rest
}: CommonProps & InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> }) {
  const control = useControlProps(id, hint, error, className);
  return (
    <FieldShell
      id={control.id}
      label={label}
      hint={hint}
      error={error}
      className={wrapperClassName}
    >
      <input ref={ref} {...control} {...rest} />
    </FieldShell>
  );
}

export function TextAreaField({
  label,
  hint,
  error,
  wrapperClassName,
  id,
  className,
  ref,
  ...rest
}: CommonProps & TextareaHTMLAttributes<HTMLTextAreaElement> & { ref?: Ref<HTMLTextAreaElement> }) {
  const control = useControlProps(id, hint, error, className);
  return (
    <FieldShell
      id={control.id}
      label={label}
      hint={hint}
      error={error}
      className={wrapperClassName}
    >
      <textarea ref={ref} rows={3} {...control} {...rest} />
    </FieldShell>
  );
}

export function SelectField({
  label,
  hint,
  error,
  wrapperClassName,
  id,
  className,
  ref,
  children,
  ...rest
}: CommonProps & SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> }) {
  const control = useControlProps(id, hint, error, className);
  return (
    <FieldShell
      id={control.id}
      label={label}
      hint={hint}
      error={error}
      className={wrapperClassName}
    >
      <select ref={ref} {...control} {...rest}>
        {children}
      </select>
    </FieldShell>
  );
}
