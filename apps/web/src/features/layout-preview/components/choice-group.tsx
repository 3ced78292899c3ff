import { useId } from 'react';
import { cn } from '../../../components/ui/cn';

interface ChoiceGroupProps<T extends string | number> {
  legend: string;
  value: T;
  options: ReadonlyArray<{ value: T; label: string }>;
  onChange: (value: T) => void;
}

/** A row of radio buttons drawn as large, touch-friendly segments. */
export function ChoiceGroup<T extends string | number>({
  legend,
  value,
  options,
  onChange,
}: ChoiceGroupProps<T>) {
  const name = useId();
  return (
    <fieldset className="min-w-0">
      <legend className="mb-1 font-semibold">{legend}</legend>
      <div className="flex flex-wrap gap-2">
        {options.map((option) => (
          <label
            key={String(option.value)}
            className={cn(
              'flex min-h-11 cursor-pointer items-center gap-2 rounded-md border px-3 py-2',
              option.value === value
                ? 'border-moss-700 bg-moss-50 font-semibold text-moss-900'
                : 'border-line-strong bg-white',
            )}
          >
            <input
              type="radio"
              name={name}
              className="h-4 w-4 accent-moss-700"
              checked={option.value === value}
              onChange={() => onChange(option.value)}
            />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
