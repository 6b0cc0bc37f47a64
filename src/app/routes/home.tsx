import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { MeResponse } from '@shared/schemas/auth';
import { lengthFormat } from '@shared/units';
import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { ROLE_LABEL, ROLE_SUMMARY } from '@/features/auth/lib/role-label';
import { useHealth } from '@/features/system/api/get-health';
import { PAPER_LABEL, UNIT_LABEL } from '@/features/studio/lib/studio-form';

interface NextStep {
  to: string;
  title: string;
  text: string;
}

/** Only screens that exist are offered, and only those the member's role may use. */
function nextSteps(me: MeResponse): NextStep[] {
  const account = { to: paths.account.href(), title: 'Your account', text: 'Change your name or your password.' };
  const clients = { to: paths.clients.href(), title: 'Clients', text: "Find a client and read their measurement sets." };
  if (!isOwner(me)) {
    return [
      { to: paths.queue.href(), title: 'Work queue', text: 'Approved drafts waiting to be cut.' },
      clients,
      account,
    ];
  }
  return [
    { ...clients, text: 'Add a client, take measurements at a fitting, and see their history.' },
    { to: paths.fabrics.href(), title: 'Fabrics', text: 'Record each knit with its stretch and recovery.' },
    { to: paths.drafts.href(), title: 'Drafts', text: 'Draft a style from a client\'s block and a fabric.' },
    {
      to: paths.studio.href(),
      title: 'Check the studio defaults',
      text: 'Unit, paper, seam and hem allowances and binding ratio: every new draft and print starts from them.',
    },
    { to: `${paths.studio.href()}#members`, title: 'Review the members', text: 'Change a role, disable an account or remove someone.' },
    account,
  ];
}

function Figure({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="rounded-lg bg-surface p-4">
      <dt className="text-sm text-muted">{label}</dt>
      <dd className="num mt-1 text-xl font-semibold">{children}</dd>
    </div>
  );
}

function ServerStatus() {
  const health = useHealth();
  const up = health.data?.database === 'up';
  return (
    <p aria-live="polite" className="flex items-center gap-3 text-sm text-muted">
      <span aria-hidden className={`h-2.5 w-2.5 rounded-full ${health.isPending ? 'bg-line' : up ? 'bg-accent' : 'bg-danger'}`} />
      <span data-testid="server-status">
        {health.isPending
          ? 'Checking the server…'
          : up
            ? 'Server and database are running.'
            : 'The database is not answering. Your work cannot be saved until it is back.'}
      </span>
    </p>
  );
}

export function HomeRoute() {
  const me = useMember();
  const { studio, user } = me;
  const unit = studio.defaultUnit;
  return (
    <div className="space-y-6">
      <PageHeader eyebrow={studio.name} title={`Welcome, ${user.name}`} description={ROLE_SUMMARY[user.role]} />
      <div className="grid gap-6 lg:grid-cols-3">
        <Card title="Studio defaults" className="lg:col-span-2" description={`Lengths in ${UNIT_LABEL[unit].toLowerCase()}.`}>
          <dl className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
            <Figure label="Seam allowance">{lengthFormat(studio.seamAllowanceMm, unit)}</Figure>
            <Figure label="Hem allowance">{lengthFormat(studio.hemAllowanceMm, unit)}</Figure>
            <Figure label="Binding ratio">{studio.bindingRatio}</Figure>
            <Figure label="Paper">{PAPER_LABEL[studio.defaultPaper]}</Figure>
            <Figure label="Unit">{UNIT_LABEL[unit]}</Figure>
          </dl>
          <p className="mt-4 text-sm text-muted">
            {isOwner(me) ? 'You can change these on the Studio screen.' : "The studio's owners set these."}
          </p>
        </Card>
        <Card title="You">
          <dl className="space-y-3">
            <div>
              <dt className="text-sm text-muted">Name</dt>
              <dd className="font-medium">{user.name}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">E-mail</dt>
              <dd className="font-medium break-words">{user.email}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">Role</dt>
              <dd className="mt-1">
                <Badge tone={isOwner(me) ? 'accent' : 'neutral'}>{ROLE_LABEL[user.role]}</Badge>
              </dd>
            </div>
          </dl>
        </Card>
      </div>
      <Card title="What to do next">
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {nextSteps(me).map((step) => (
            <li key={step.to}>
              <Link
                to={step.to}
                className="group flex h-full min-h-touch flex-col rounded-lg border border-line p-4 hover:border-accent hover:bg-accent-soft"
              >
                <span className="font-semibold text-accent-strong group-hover:underline">{step.title}</span>
                <span className="mt-1 text-sm text-muted">{step.text}</span>
              </Link>
            </li>
          ))}
        </ul>
      </Card>
      <ServerStatus />
    </div>
  );
}
