import { useIsFetching } from '@tanstack/react-query';
import { useNavigation } from 'react-router-dom';

/**
 * A thin copper bar along the top of the window while a page's code (a lazy route) or its first data loads.
 * Refetches of data already on screen do not count. The bar fades in only after a short delay (index.css),
 * so quick changes show nothing.
 */
export function RouteProgress() {
  const navigation = useNavigation();
  const firstLoads = useIsFetching({ predicate: (q) => q.state.data === undefined });
  if (navigation.state === 'idle' && firstLoads === 0) return null;
  return (
    <div className="pointer-events-none fixed inset-x-0 top-0 z-50 h-[3px]" role="progressbar" aria-label="Loading the page">
      <div className="sw-route-progress h-full bg-copper" />
    </div>
  );
}
