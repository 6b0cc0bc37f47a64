import { describe, expect, it } from 'vitest';
import { clientListQuerySchema } from '@shared/schemas/client';
import { CLIENT_LIST_DEFAULTS, CLIENT_PAGE_SIZE, listParamsRead, listParamsWrite, listQuery, pageCount } from './list-params';

describe('the clients table in the address bar', () => {
  it('reads back what it writes', () => {
    const params = { q: 'ivy', sort: 'lastTakenAt', order: 'desc', status: 'all', page: 3 } as const;
    expect(listParamsRead(listParamsWrite(params))).toEqual(params);
  });

  it('leaves defaults out of the address', () => {
    expect(listParamsWrite(CLIENT_LIST_DEFAULTS).toString()).toBe('');
  });

  it('falls back to the defaults for values it does not know', () => {
    const read = listParamsRead(new URLSearchParams('sort=phone&order=up&status=deleted&page=-2'));
    expect(read).toEqual(CLIENT_LIST_DEFAULTS);
    expect(listParamsRead(new URLSearchParams('page=2.5')).page).toBe(1);
  });

  it('asks the API with a query its own schema accepts', () => {
    const query = listQuery({ ...CLIENT_LIST_DEFAULTS, q: '  ivy ', page: 2 });
    expect(query).toEqual({ q: 'ivy', sort: 'name', order: 'asc', status: 'active', page: 2, pageSize: CLIENT_PAGE_SIZE });
    expect(clientListQuerySchema.safeParse(query).success).toBe(true);
    expect('q' in listQuery(CLIENT_LIST_DEFAULTS)).toBe(false);
  });

  it('counts pages, with at least one', () => {
    expect(pageCount(0)).toBe(1);
    expect(pageCount(CLIENT_PAGE_SIZE)).toBe(1);
    expect(pageCount(CLIENT_PAGE_SIZE + 1)).toBe(2);
  });
});
