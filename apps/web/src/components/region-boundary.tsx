import { Component, type ReactNode } from 'react';
import { ErrorState } from './error-state';

interface RegionBoundaryProps {
  children: ReactNode;
  headingLevel?: 'h2' | 'h3' | 'h4';
  className?: string;
}

/** Keeps a fault in one region (a board column, a job panel) from taking the whole page down. */
export class RegionBoundary extends Component<RegionBoundaryProps, { error: unknown }> {
  override state: { error: unknown } = { error: null };

  static getDerivedStateFromError(error: unknown) {
    return { error };
  }

  override render() {
    if (this.state.error === null) return this.props.children;
    return (
      <ErrorState
        error={this.state.error}
        headingLevel={this.props.headingLevel ?? 'h3'}
        className={this.props.className}
        onRetry={() => this.setState({ error: null })}
      />
    );
  }
}
