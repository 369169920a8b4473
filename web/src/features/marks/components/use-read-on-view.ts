import { useEffect, type RefObject } from 'react';

const THRESHOLDS = Array.from({ length: 11 }, (_, i) => i / 10);

/** Half of the element on screen, or, for a thread taller than the screen, 40 % of the screen filled by it. */
function isSeen(entry: IntersectionObserverEntry): boolean {
  if (!entry.isIntersecting) return false;
  const screen = entry.rootBounds?.height ?? window.innerHeight;
  return entry.intersectionRatio >= 0.5 || entry.intersectionRect.height >= screen * 0.4;
}

/**
 * Calls `onSeen` once, the first time the element is fairly on screen while the page is visible
 * (a tab in the background reads nothing). Without IntersectionObserver being shown counts as seen.
 */
export function useReadOnView(
  ref: RefObject<HTMLElement | null>,
  enabled: boolean,
  onSeen: () => void,
): void {
  useEffect(() => {
    const element = ref.current;
    if (!enabled || !element) return;
    if (typeof IntersectionObserver === 'undefined') {
      onSeen();
      return;
    }
    let done = false;
    let latest: IntersectionObserverEntry | undefined;
    const check = () => {
      if (done || !latest || document.visibilityState !== 'visible' || !isSeen(latest)) return;
      done = true;
      observer.disconnect();
      document.removeEventListener('visibilitychange', check);
      onSeen();
    };
    const observer = new IntersectionObserver(
      (entries) => {
        latest = entries[entries.length - 1];
        check();
      },
      { threshold: THRESHOLDS },
    );
    observer.observe(element);
    document.addEventListener('visibilitychange', check);
    return () => {
      observer.disconnect();
      document.removeEventListener('visibilitychange', check);
    };
  }, [ref, enabled, onSeen]);
}
