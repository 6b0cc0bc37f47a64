import type { ReactNode } from 'react';
import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '../hooks/use-member';

export interface OwnersOnlyProps {
  /** What the screen is for, e.g. "The studio's members and defaults". */
  what: string;
  children: ReactNode;
}

/**
 * Shows `children` to owners only; a cutter who follows a link here learns why they cannot see
 * it. The server refuses these requests too: this only keeps the screen honest.
 */
export function OwnersOnly({ what, children }: OwnersOnlyProps) {
  const me = useMember();
  if (isOwner(me)) return <>{children}</>;
  return (
    <div className="mx-auto max-w-xl py-12">
      <p className="text-sm font-medium text-muted">Owners only</p>
      <h1 className="mt-1 text-2xl font-semibold tracking-tight">This screen is for the studio's owners</h1>
      <p className="mt-3 text-muted">
        {what} can be seen and changed by an owner of {me.studio.name} only. You are signed in as a cutter. If something
        here needs changing, ask an owner.
      </p>
      <ButtonLink to={paths.home.href()} variant="primary" className="mt-6">
        Back to the overview
      </ButtonLink>
    </div>
  );
}
