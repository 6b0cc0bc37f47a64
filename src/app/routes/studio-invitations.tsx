import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OwnersOnly } from '@/features/auth/components/owners-only';
import { isOwner } from '@/features/auth/hooks/use-member';
import { invitationsQueryOptions } from '@/features/invitations/api/get-invitations';
import { InvitationsSection } from '@/features/invitations/components/invitations-section';
import { queryClient } from '@/lib/query-client';

/** Owners get the invitations with the screen; a cutter asks the server for nothing. */
export async function studioInvitationsLoader() {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (isOwner(me)) await queryClient.ensureQueryData(invitationsQueryOptions());
  return null;
}

export function StudioInvitationsRoute() {
  return (
    <OwnersOnly what="The studio's invitations">
      <div className="mx-auto max-w-5xl">
        <PageHeader
          eyebrow={
            <ButtonLink to={paths.studio.href()} variant="ghost" compact className="-ml-3">
              ← Studio
            </ButtonLink>
          }
          title="Invitations"
          description="Give cutters and fellow owners their own sign-in. Each person joins through the link in their e-mail."
          actions={
            <ButtonLink to={paths.studioMail.href()} compact>
              Sent mail
            </ButtonLink>
          }
        />
        <InvitationsSection />
      </div>
    </OwnersOnly>
  );
}
