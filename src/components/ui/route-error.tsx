import { Component, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';

/** What a page that failed shows: the error's message, Reload, and the way back to the start page. */
export function RouteError({ error }: { error: unknown }) {
  const message = error instanceof Error ? error.message : 'Unknown error';
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <h1 className="text-xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <p className="mt-6 flex justify-center gap-4">
        <button type="button" className="text-copper underline" onClick={() => window.location.reload()}>
          Reload
        </button>
        <Link className="text-copper underline" to={paths.home}>
          Back to the start page
        </Link>
      </p>
    </div>
  );
}

/** Catches a page that throws while rendering (or whose code failed to load); keyed by the address, so leaving resets it. */
export class RouteErrorBoundary extends Component<{ children: ReactNode }, { error: unknown }> {
  override state = { error: undefined as unknown };
  static getDerivedStateFromError(error: unknown) {
    return { error: error ?? new Error('Unknown error') };
  }
  override render() {
    return this.state.error === undefined ? this.props.children : <RouteError error={this.state.error} />;
  }
}
