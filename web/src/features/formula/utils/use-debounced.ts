import { useEffect, useState } from 'react';

/**
 * The value once it has stopped changing for `ms`. Compared as JSON, so a form re-render that
 * builds an equal object does not restart the wait or ask the API again.
 */
export function useDebounced<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(JSON.parse(key) as T), ms);
    return () => clearTimeout(timer);
  }, [key, ms]);
  return settled;
}
