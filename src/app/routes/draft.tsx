import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { draftQueryOptions, useDraft } from '@/features/drafts/api/get-draft';
import { DraftWorkspace } from '@/features/drafts/components/draft-workspace';
import { useFabrics } from '@/features/fabrics/api/get-fabrics';
import { useMember } from '@/features/auth/hooks/use-member';
import { PrintButton } from '@/features/printing/components/print-button';
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

/** The drafting workspace (this module and the engine load only when a draft is opened). */
export function DraftRoute() {
  const id = draftIdParam(useParams().draftId);
  const draft = useDraft(id);
  const fabrics = useFabrics({ sort: 'name', order: 'asc', pageSize: 100 });
  const { studio } = useMember();
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
      printActions={(c) => <PrintButton draftId={c.draft.id} draft={c.draft} unsaved={c.unsaved} studio={studio} />}
    />
  );
}
