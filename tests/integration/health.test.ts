import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { testAppCreate } from '../helpers/test-app.js';

describe('GET /api/health', () => {
  const up = testAppCreate();
  // A port nothing listens on stands for a database that is down.
  const down = testAppCreate({ DB_PORT: '9', DB_NAME: 'knitwright_test' });

  afterAll(async () => {
    await up.close();
    await down.close();
  });

  it('answers 200 with the database up', async () => {
    const res = await request(up.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'up' });
  });

  it('answers 503 with the database down', async () => {
    const res = await request(down.app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ database: 'down' });
  });

  it('answers unknown API paths with the one error shape', async () => {
    const res = await request(up.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: expect.any(String) } });
  });
});
