import { useEffect, useId, useState } from 'react';

interface SearchBoxProps {
  value: string;
  onSearch: (value: string) => void;
  label: string;
  delayMs?: number;
  placeholder?: string;
}

/** A search field that reports what was typed once the typing pauses. */
export function SearchBox({
  value,
  onSearch,
  label,
  delayMs = 300,
  placeholder = 'Name, e-mail or phone',
}: SearchBoxProps) {
  const id = useId();
  const [text, setText] = useState(value);
  const [lastValue, setLastValue] = useState(value);

  // The URL changed under us (back button, a link): show what it says now.
  if (value !== lastValue) {
    setLastValue(value);
    setText(value);
  }

  // Debouncing the URL update is timer work, not data fetching.
  useEffect(() => {
    if (text.trim() === value) return;
    const timer = window.setTimeout(() => onSearch(text.trim()), delayMs);
    return () => window.clearTimeout(timer);
  }, [text, value, onSearch, delayMs]);

  return (
    <div className="flex min-w-60 flex-1 flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <input
        id={id}
        type="search"
        value={text}
        onChange={(event) => setText(event.target.value)}
        placeholder={placeholder}
        className="min-h-11 rounded-md border border-line-strong bg-white px-3 py-2"
      />
    </div>
  );
}
