import { useCallback, useState } from 'react';

/**
 * Moves focus to an element the next time it appears: the Edit button once the edit form
 * closes, the form's heading once it opens. Without it, focus falls back to the page's start
 * when the focused control unmounts. `request()` arms it; `target` is the element's ref callback.
 */
export function useFocusWhenShown<T extends HTMLElement>() {
  const [isArmed, setIsArmed] = useState(false);
  const target = useCallback(
    (node: T | null) => {
      if (node && isArmed) {
        node.focus();
        setIsArmed(false);
      }
    },
    [isArmed],
  );
  const request = useCallback(() => setIsArmed(true), []);
  return { target, request };
}
