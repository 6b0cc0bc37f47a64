import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { PasswordForm } from '@/features/auth/components/password-form';
import { ProfileForm } from '@/features/auth/components/profile-form';
import { useMember } from '@/features/auth/hooks/use-member';
import { ROLE_LABEL } from '@/features/auth/lib/role-label';

export function AccountRoute() {
  const me = useMember();
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader eyebrow={me.studio.name} title="Your account" description="Your name as the studio sees it, and your password." />
      <div className="space-y-6">
        <Card title="Signed in as">
          <dl className="grid gap-4 sm:grid-cols-[minmax(0,3fr)_minmax(0,2fr)_auto]">
            <div>
              <dt className="text-sm text-muted">E-mail</dt>
              <dd className="mt-1 font-medium break-words">{me.user.email}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">Studio</dt>
              <dd className="mt-1 font-medium">{me.studio.name}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">Role</dt>
              <dd className="mt-1">
                <Badge tone={me.user.role === 'owner' ? 'accent' : 'neutral'}>{ROLE_LABEL[me.user.role]}</Badge>
              </dd>
            </div>
          </dl>
        </Card>
        <Card title="Profile">
          <ProfileForm />
        </Card>
        <Card title="Password" description="A new password signs you out on your other devices; you stay signed in here.">
          <PasswordForm />
        </Card>
      </div>
    </div>
  );
}
