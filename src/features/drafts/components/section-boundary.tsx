import { Component, type ErrorInfo, type ReactNode } from 'react';

export interface SectionBoundaryProps {
  /** What the section is, in the message ("The pattern drawing"). */
  name: string;
  children: ReactNode;
  /** Changing it clears the error (e.g. new parameters). */
  resetKey?: unknown;
}

interface SectionBoundaryState {
  error: Error | null;
  key: unknown;
}

/** Keeps one failing section (the canvas, the figures) from taking the whole workspace down. */
export class SectionBoundary extends Component<SectionBoundaryProps, SectionBoundaryState> {
  override state: SectionBoundaryState = { error: null, key: undefined };

  static getDerivedStateFromError(error: Error): Partial<SectionBoundaryState> {
    return { error };
  }

  static getDerivedStateFromProps(props: SectionBoundaryProps, state: SectionBoundaryState): Partial<SectionBoundaryState> | null {
    if (props.resetKey !== state.key) return { key: props.resetKey, error: null };
    return null;
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error(`${this.props.name} failed`, error, info.componentStack);
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <div role="alert" className="m-3 rounded-lg border border-danger/40 bg-danger/5 p-4 text-sm">
        <p className="font-semibold text-danger">{this.props.name} could not be shown.</p>
        <p className="mt-1 text-ink">
          Your values are kept and can still be saved. Undo the last change or reload the page; the message was: {this.state.error.message}
        </p>
      </div>
    );
  }
}
