import { Component, type ErrorInfo, type ReactNode } from 'react';

/** Keeps a fragile section (a lazily loaded chart, say) from taking the whole page down; shows `fallback` instead. */
export class ErrorBoundary extends Component<{ fallback: ReactNode; children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };

  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.warn('Section failed to render', error.message, info.componentStack);
  }

  override render() {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}
