import { useEffect, useState } from 'react';

/**
 * The value once it has stopped changing for `delay` ms (compared by its JSON text, so a new
 * object with the same content is not a change). Typing therefore sends one request per pause.
 */
export function useDebouncedValue<T>(value: T, delay = 300): T {
  const text = JSON.stringify(value);
  const [settled, setSettled] = useState<{ text: string; value: T }>({ text, value });
  useEffect(() => {
    if (text === settled.text) return;
    const timer = setTimeout(() => setSettled({ text, value }), delay);
    return () => clearTimeout(timer);
    // `value` is represented by `text`.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [text, delay, settled.text]);
  return settled.value;
}
