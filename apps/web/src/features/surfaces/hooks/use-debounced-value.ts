import { useEffect, useState } from 'react';

/**
 * A value that follows its input only after the input has stopped changing for `delayMs`.
 * @param value the changing value
 * @param delayMs quiet time in milliseconds
 * @returns the settled value
 * @example const settled = useDebouncedValue(body, 400);
 */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
