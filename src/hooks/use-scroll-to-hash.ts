import { useEffect } from 'react';
import { useLocation } from 'react-router-dom';

/**
 * Once the page's data has rendered (`ready`), bring the element the link's #fragment names into view: the browser
 * does this itself only for content present at load, not for what a lazy page draws after its data arrives (a
 * comment or the review thread load after the build). Looks for the element for up to 3 s.
 */
export function useScrollToHash(ready: boolean): void {
  const { hash } = useLocation();
  useEffect(() => {
    if (!ready || hash.length < 2) return;
    const id = decodeURIComponent(hash.slice(1));
    let tries = 0;
    const timer = setInterval(() => {
      const el = document.getElementById(id);
      if (el) el.scrollIntoView({ block: 'start' });
      if (el || ++tries >= 30) clearInterval(timer);
    }, 100);
    return () => clearInterval(timer);
  }, [ready, hash]);
}
