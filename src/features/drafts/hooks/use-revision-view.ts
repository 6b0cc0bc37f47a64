import { useMemo } from 'react';
import { draft as engineDraft, type Draft } from '@shared/engine';
import type { RevisionDto } from '@shared/schemas/draft-dto';
import { useRevision } from '../api/get-revisions';

export interface RevisionView {
  revision: RevisionDto | null;
  draft: Draft | null;
  loading: boolean;
  error: string | null;
}

/** An older revision drawn from its stored input by the engine, to look at beside the current one. */
export function useRevisionView(draftId: number, rev: number | null): RevisionView {
  const query = useRevision(draftId, rev);
  const drawn = useMemo(() => (query.data ? engineDraft(query.data.input) : null), [query.data]);
  if (rev === null) return { revision: null, draft: null, loading: false, error: null };
  return {
    revision: query.data ?? null,
    draft: drawn?.ok ? drawn.draft : null,
    loading: query.isPending,
    error: query.isError ? query.error.message : drawn && !drawn.ok ? drawn.errors.map((e) => e.message).join(' ') : null,
  };
}
