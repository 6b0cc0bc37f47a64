/**
 * The clients table's state as it lives in the address bar, so a search, a sort or a page can
 * be bookmarked, shared and restored with Back. Bad values fall back to the defaults.
 */
import { CLIENT_SORTS, type ClientListQueryInput } from '@shared/schemas/client';

export type ClientSort = (typeof CLIENT_SORTS)[number];
export type ClientStatus = 'active' | 'archived' | 'all';

export interface ClientListParams {
  q: string;
  sort: ClientSort;
  order: 'asc' | 'desc';
  status: ClientStatus;
  page: number;
}

export const CLIENT_PAGE_SIZE = 20;

export const CLIENT_LIST_DEFAULTS: ClientListParams = { q: '', sort: 'name', order: 'asc', status: 'active', page: 1 };

const STATUSES: readonly ClientStatus[] = ['active', 'archived', 'all'];

/** Reads the table's state from the address bar's search parameters. */
export function listParamsRead(search: URLSearchParams): ClientListParams {
  const sort = search.get('sort');
  const order = search.get('order');
  const status = search.get('status');
  const page = Number(search.get('page'));
  return {
    q: (search.get('q') ?? '').slice(0, 120),
    sort: (CLIENT_SORTS as readonly string[]).includes(sort ?? '') ? (sort as ClientSort) : CLIENT_LIST_DEFAULTS.sort,
    order: order === 'desc' ? 'desc' : 'asc',
    status: STATUSES.includes(status as ClientStatus) ? (status as ClientStatus) : CLIENT_LIST_DEFAULTS.status,
    page: Number.isInteger(page) && page >= 1 ? page : 1,
  };
}

/** Writes the state back, leaving defaults out so the address stays short. */
export function listParamsWrite(params: ClientListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.q.trim()) search.set('q', params.q);
  if (params.sort !== CLIENT_LIST_DEFAULTS.sort) search.set('sort', params.sort);
  if (params.order !== CLIENT_LIST_DEFAULTS.order) search.set('order', params.order);
  if (params.status !== CLIENT_LIST_DEFAULTS.status) search.set('status', params.status);
  if (params.page !== 1) search.set('page', String(params.page));
  return search;
}

/** The API query for the table's state. */
export function listQuery(params: ClientListParams): ClientListQueryInput {
  const q = params.q.trim();
  return {
    ...(q ? { q } : {}),
    sort: params.sort,
    order: params.order,
    status: params.status,
    page: params.page,
    pageSize: CLIENT_PAGE_SIZE,
  };
}

/** Pages needed for `total` rows. */
export function pageCount(total: number, pageSize: number = CLIENT_PAGE_SIZE): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
