import { Suspense, useEffect, useRef, useState, type ReactNode } from 'react';
import { AFTER_FIRST_SCREEN_MS } from '../../../lib/after-first-screen';

/**
 * A section below the first screen whose code is fetched after that screen has shown: when the owner
 * scrolls to it, or a moment after the page appeared, whichever comes first. A phone on a slow link
 * then spends its first seconds on the report view, not on the slider or the consent switch. The
 * placeholder (a skeleton of the section's height) stands in until then, so nothing pops in late.
 */
export function Deferred({ children, placeholder = null }: { children: ReactNode; placeholder?: ReactNode }) {
  const spot = useRef<HTMLDivElement>(null);
  const [show, setShow] = useState(false);
  useEffect(() => {
    if (show) return;
    const timer = window.setTimeout(() => setShow(true), AFTER_FIRST_SCREEN_MS);
    const near = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setShow(true), { rootMargin: '0px' });
    if (spot.current) near.observe(spot.current);
    return () => (window.clearTimeout(timer), near.disconnect());
  }, [show]);
  if (!show) return <div ref={spot}>{placeholder}</div>;
  return <Suspense fallback={placeholder}>{children}</Suspense>;
}
