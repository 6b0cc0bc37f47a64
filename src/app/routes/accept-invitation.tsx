import { Link, useNavigate, useParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { AuthCard } from '@/features/auth/components/auth-card';
import { ROLE_LABEL, ROLE_SUMMARY } from '@/features/auth/lib/role-label';
import { useInvitationOffer } from '@/features/invitations/api/get-invitation-offer';
import { AcceptInvitationForm } from '@/features/invitations/components/accept-invitation-form';

const until = (iso: string) => new Date(iso).toLocaleString(undefined, { weekday: 'long', month: 'long', day: 'numeric', hour: '2-digit', minute: '2-digit' });

export function AcceptInvitationRoute() {
  const token = useParams().token ?? '';
  const navigate = useNavigate();
  const offer = useInvitationOffer(token);
  const { data: me } = useMe();

  if (offer.isPending) {
    return (
      <AuthCard title="Invitation">
        <LoadingState>Checking the invitation…</LoadingState>
      </AuthCard>
    );
  }
  if (offer.isError) {
    return (
      <AuthCard title="This invitation cannot be used">
        <Alert tone="error">{offer.error.message}</Alert>
        <ButtonLink to={paths.signIn.href()} variant="primary" block className="mt-5">
          Go to sign in
        </ButtonLink>
      </AuthCard>
    );
  }
  const o = offer.data;
  return (
    <AuthCard
      title={`Join ${o.studioName}`}
      description={
        <>
          {o.invitedBy ? `${o.invitedBy} invited you` : 'You are invited'} as {o.role === 'owner' ? 'an' : 'a'} <strong className="text-ink">{ROLE_LABEL[o.role].toLowerCase()}</strong>.{' '}
          {ROLE_SUMMARY[o.role]}
        </>
      }
      footer={
        <>
          Already a member?{' '}
          <Link to={paths.signIn.href()} className="font-medium text-accent underline underline-offset-2 hover:text-accent-strong">
            Sign in
          </Link>
        </>
      }
    >
      {me && (
        <Alert tone="info" className="mb-5">
          You are signed in as {me.user.email}. Joining signs you in as the new member instead.
        </Alert>
      )}
      <p className="mb-5 text-sm text-muted">The link works once, until {until(o.expiresAt)}.</p>
      <AcceptInvitationForm token={token} email={o.email} onAccepted={() => void navigate(paths.home.href(), { replace: true })} />
    </AuthCard>
  );
}
