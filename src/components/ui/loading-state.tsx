import type { ReactNode } from 'react';
import { Spinner } from './spinner';

export interface LoadingStateProps {
  /** What is being loaded, e.g. "Loading members…". */
  children: ReactNode;
}

/** A polite live message while data arrives. */
export function LoadingState({ children }: LoadingStateProps) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-muted">
      <Spinner />
      {children}
    </p>
  );
}

/** The whole window while the first screen loads (before any layout exists). */
export function PageLoading({ children = 'Opening Knitwright…' }: Partial<LoadingStateProps>) {
  return (
    <div className="grid min-h-screen place-items-center">
      <LoadingState>{children}</LoadingState>
    </div>
  );
}
