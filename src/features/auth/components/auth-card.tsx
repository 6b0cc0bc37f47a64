import type { ReactNode } from 'react';

export interface AuthCardProps {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Links under the card, e.g. to the other of sign-in and sign-up. */
  footer?: ReactNode;
}

/** The narrow centred panel of the sign-in and sign-up pages. */
export function AuthCard({ title, description, children, footer }: AuthCardProps) {
  return (
    <div className="mx-auto w-full max-w-md py-6 sm:py-12">
      <div className="rounded-2xl border border-line bg-panel p-6 shadow-sm sm:p-8">
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
        {description && <p className="mt-2 text-muted">{description}</p>}
        <div className="mt-6">{children}</div>
      </div>
      {footer && <div className="mt-6 text-center text-sm text-muted">{footer}</div>}
    </div>
  );
}
