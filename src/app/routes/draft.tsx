import { useQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { draftQueryOptions, useDraft } from '@/features/drafts/api/get-draft';
import { DraftWorkspace } from '@/features/drafts/components/draft-workspace';
import { useFabrics } from '@/features/fabrics/api/get-fabrics';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { clientQueryOptions } from '@/features/clients/api/get-client';
import { DraftMailButton } from '@/features/mail/components/draft-mail-button';
import type { MailDocuments } from '@/features/mail/components/draft-mail-dialog';
import { PrintButton } from '@/features/printing/components/print-button';
import { KIND_CHOICES, paperDefault, paperLabel } from '@/features/printing/lib/print-settings';
import { queryClient } from '@/lib/query-client';

/** The draft id in the address, or a 404 for anything else. */
function draftIdParam(raw: string | undefined): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such draft', { status: 404, statusText: 'No such draft' });
  return id;
}

export async function draftLoader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(draftQueryOptions(draftIdParam(params.draftId)));
  return null;
}

/** The e-mail dialog offers the print dialog's documents and papers. */
const MAIL_DOCUMENTS: MailDocuments = { kinds: KIND_CHOICES, paperLabel, paperDefault };

/** The drafting workspace (this module and the engine load only when a draft is opened). */
export function DraftRoute() {
  const id = draftIdParam(useParams().draftId);
  const draft = useDraft(id);
  const fabrics = useFabrics({ sort: 'name', order: 'asc', pageSize: 100 });
  const me = useMember();
  const { studio } = me;
  const owner = isOwner(me);
  // Owners may send to the client: their address (hidden from cutters) says whether they can.
  const clientId = draft.data?.client.id ?? 0;
  const client = useQuery({ ...clientQueryOptions(clientId), enabled: owner && clientId > 0 });
  if (draft.isPending) return <LoadingState>Loading the draft…</LoadingState>;
  if (draft.isError) {
    return (
      <Alert tone="error" title="This draft could not be loaded">
        <p>{draft.error.message}</p>
        <ButtonLink compact className="mt-2" to={paths.drafts.href()}>
          Back to the drafts
        </ButtonLink>
      </Alert>
    );
  }
  return (
    <DraftWorkspace
      key={draft.data.id}
      draft={draft.data}
      fabrics={fabrics.data?.items.map((f) => ({ id: f.id, name: f.name })) ?? []}
      printActions={(c) => (
        <>
          <PrintButton draftId={c.draft.id} draft={c.draft} unsaved={c.unsaved} studio={studio} />
          <DraftMailButton
            draftId={c.draft.id}
            title={`${c.draft.client.name}, ${c.draft.style.name}`}
            revision={c.draft.current.number}
            unsaved={c.unsaved}
            owner={owner}
            client={{ name: c.draft.client.name, email: client.isError ? null : client.data?.email }}
            studioPaper={studio.defaultPaper}
            documents={MAIL_DOCUMENTS}
          />
        </>
      )}
    />
  );
}
