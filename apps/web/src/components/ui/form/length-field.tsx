import { useEffect, useRef, useState, type InputHTMLAttributes } from 'react';
import { get, useController, useFormContext, type FieldError } from 'react-hook-form';
import { useUnits } from '../../../lib/units';
import { TextField as TextControl } from '../form-fields';
import type { FieldProps } from './fields';
import { useFormStatus } from './form-status';

type Native = Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'name' | 'defaultValue' | 'value' | 'onChange' | 'onBlur' | 'type'
>;

/**
 * A length typed as the company writes it (`27' 6"`, `27 ft 6 in`, `27.5`, or `8.4 m` for a
 * metric company). The form holds the length in feet (null while empty or unreadable); the
 * box keeps what was typed and shows the parser's message under it as you type.
 */
export function LengthField({ name, label, hint, ...rest }: FieldProps & Native) {
  const units = useUnits();
  const { control } = useFormContext();
  const { registerField } = useFormStatus();
  useEffect(() => registerField(name), [name, registerField]);
  const {
    field: { onChange, onBlur, ref, ...field },
    fieldState,
    formState,
  } = useController({ name, control });
  const value: unknown = field.value;
  const feet = typeof value === 'number' ? value : null;
  const [text, setText] = useState(() => (feet === null ? '' : units.length(feet)));
  const [parseError, setParseError] = useState<string | null>(null);

  // What this box last wrote into the form. Any other value came from outside (a reset, a
  // value set by the form) and rewrites the box; what the person typed is never rewritten.
  const written = useRef<number | null>(feet);
  useEffect(() => {
    if (feet === written.current) return;
    written.current = feet;
    setText(feet === null ? '' : units.length(feet));
    setParseError(null);
  }, [feet, units]);

  const schemaError =
    fieldState.error?.message ??
    get<typeof formState.errors, FieldError | undefined>(formState.errors, name)?.message;
  return (
    <TextControl
      {...rest}
      label={label}
      hint={hint ?? units.lengthExamples}
      name={name}
      ref={ref}
      value={text}
      error={parseError ?? schemaError}
      autoComplete="off"
      spellCheck={false}
      autoCapitalize="off"
      className="tabular-nums"
      onBlur={onBlur}
      onChange={(event) => {
        const typed = event.target.value;
        setText(typed);
        if (typed.trim() === '') {
          setParseError(null);
          written.current = null;
          onChange(null);
          return;
        }
        const read = units.parseLength(typed);
        setParseError(read.ok ? null : read.error.message);
        written.current = read.ok ? read.feet : null;
        onChange(written.current);
      }}
    />
  );
}
