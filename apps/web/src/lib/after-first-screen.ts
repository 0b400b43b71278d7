import { useCallback, useEffect, useRef, useState } from 'react';

/** How long after a page appears its deferred parts load on their own. */
export const AFTER_FIRST_SCREEN_MS = 1500;

/**
 * For a control whose code is not part of the first screen: false until a moment after the page showed,
 * or until `wake()` (call it on hover, focus or a first tap), so a cold visit fetches that code after the
 * first screen instead of before it.
 */
export function useAfterFirstScreen(): [ready: boolean, wake: () => void] {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    if (ready) return;
    const timer = window.setTimeout(() => setReady(true), AFTER_FIRST_SCREEN_MS);
    return () => window.clearTimeout(timer);
  }, [ready]);
  return [ready, useCallback(() => setReady(true), [])];
}

/**
 * A ref for the real control that replaced a stand-in: when the user tapped the stand-in before the code
 * arrived (`tapped`), the control is clicked once on arrival, so the tap still opens its menu or list.
 */
export function useClickOnArrival<T extends HTMLElement>(tapped: boolean) {
  const ref = useRef<T>(null);
  useEffect(() => {
    if (!tapped) return;
    // After the control's own mount effects (its popover measures the target first).
    const frame = requestAnimationFrame(() => ref.current?.click());
    return () => cancelAnimationFrame(frame);
    // Only on arrival: later taps reach the control itself.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
  return ref;
}
