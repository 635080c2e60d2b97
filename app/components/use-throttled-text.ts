import { useEffect, useRef, useState } from "react";

/**
 * `text`, changed at most once every `intervalMs`: the first text at once,
 * later ones when the interval has passed (the newest then). For a polite
 * live region over something that changes many times a second, so a screen
 * reader hears "40,000 of 100,000 rows checked" now and then, not every tick.
 */
export function useThrottledText(text: string, intervalMs: number): string {
  const [shown, setShown] = useState(text);
  const shownAt = useRef(Number.NEGATIVE_INFINITY);
  useEffect(() => {
    const show = () => {
      shownAt.current = Date.now();
      setShown(text);
    };
    const wait = shownAt.current + intervalMs - Date.now();
    // A timer even when no wait is left: the text is set outside the effect's own run.
    const timer = setTimeout(show, Math.max(0, wait));
    return () => clearTimeout(timer);
  }, [text, intervalMs]);
  return shown;
}
