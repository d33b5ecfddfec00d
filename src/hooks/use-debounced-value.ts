import { useEffect, useState } from "react";

/**
 * The value once it has stopped changing for `delayMs`: a search box asks the server after the
 * technician pauses, not at every letter (300 ms is about the gap between typed words on a phone).
 */
export function useDebouncedValue<T>(value: T, delayMs = 300): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
