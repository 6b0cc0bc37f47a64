import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StyleDto } from '@shared/schemas/style';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

/** GET /api/styles: the studio's styles in use, by name. */
export const getStyles = (signal?: AbortSignal) => api<{ items: StyleDto[] }>('/styles', { signal });

export const stylesQueryOptions = () =>
  queryOptions({ queryKey: draftKeys.styles(), queryFn: ({ signal }) => getStyles(signal), select: (data) => data.items });

export const useStyles = () => useQuery(stylesQueryOptions());
