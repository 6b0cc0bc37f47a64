import { useQueryClient } from '@tanstack/react-query';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { authKeys } from '@/features/auth/api/auth-keys';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OwnersOnly } from '@/features/auth/components/owners-only';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { membersQueryOptions } from '@/features/studio/api/get-members';
import { studioQueryOptions, useStudio } from '@/features/studio/api/get-studio';
import { MembersSection } from '@/features/studio/components/members-section';
import { StudioDefaultsForm } from '@/features/studio/components/studio-defaults-form';
import { queryClient } from '@/lib/query-client';

/** Owners get their studio and members loaded with the screen; a cutter asks the server for nothing. */
export async function studioLoader() {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (isOwner(me)) await Promise.all([queryClient.ensureQueryData(studioQueryOptions()), queryClient.ensureQueryData(membersQueryOptions())]);
  return null;
}

function StudioScreen() {
  const me = useMember();
  const studio = useStudio();
  const client = useQueryClient();
  const meRefresh = () => void client.invalidateQueries({ queryKey: authKeys.me() });
  return (
    <div className="mx-auto max-w-5xl">
      <PageHeader
        eyebrow="Studio"
        title={studio.data?.name ?? me.studio.name}
        description="The defaults every new draft and print starts from, and the people who work in the studio."
        actions={
          <>
            <ButtonLink to={paths.studioInvitations.href()}>Invitations</ButtonLink>
            <ButtonLink to={paths.studioMail.href()}>Sent mail</ButtonLink>
          </>
        }
      />
      <div className="space-y-6">
        <Card title="Defaults" description="Lengths are shown and typed in the studio's unit.">
          {studio.isPending && <LoadingState>Loading the studio defaults…</LoadingState>}
          {studio.isError && (
            <Alert tone="error" title="The studio defaults could not be loaded">
              {studio.error.message}
            </Alert>
          )}
          {studio.data && <StudioDefaultsForm studio={studio.data} onSaved={meRefresh} />}
        </Card>
        <div id="members">
          <MembersSection
            currentUserId={me.user.id}
            onChanged={(action) => {
              if (action.member.id === me.user.id) meRefresh();
            }}
          />
        </div>
      </div>
    </div>
  );
}

export function StudioRoute() {
  return (
    <OwnersOnly what="The studio's members and defaults">
      <StudioScreen />
    </OwnersOnly>
  );
}
