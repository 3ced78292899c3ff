import type { InputHTMLAttributes } from 'react';
import { TextField } from '../../../components/ui/form-fields';

interface LengthFieldProps extends Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'onChange' | 'value'
> {
  label: string;
  value: string;
  error: string | undefined;
  hint?: string;
  onValue: (value: string) => void;
}

/** A text box for a length as the trade writes it; the parse message shows under it as you type. */
export function LengthField({ label, value, error, hint, onValue, ...rest }: LengthFieldProps) {
  return (
    <TextField
      label={label}
      value={value}
      error={error}
      hint={hint}
      onChange={(event) => onValue(event.target.value)}
      autoComplete="off"
      spellCheck={false}
      autoCapitalize="off"
      className="tabular-nums"
      {...rest}
    />
  );
}
