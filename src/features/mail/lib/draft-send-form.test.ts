import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { draftSendCheck, draftSendServerErrors, type DraftSendForm } from './draft-send-form';

const form: DraftSendForm = { kind: 'sheet', paper: 'roll36', recipient: 'address', address: 'Prints@CopyShop.example', note: '  ' };

describe('draftSendCheck', () => {
  it('sends to a typed address, lower-cased, and leaves out an empty note', () => {
    expect(draftSendCheck(form)).toEqual({ ok: true, body: { kind: 'sheet', paper: 'roll36', to: 'prints@copyshop.example' } });
  });

  it('sends "client" whatever address was typed when the client is chosen', () => {
    const checked = draftSendCheck({ ...form, recipient: 'client', address: 'not an address', note: 'Second fitting on Friday' });
    expect(checked).toEqual({ ok: true, body: { kind: 'sheet', paper: 'roll36', to: 'client', note: 'Second fitting on Friday' } });
  });

  it('names the address field when it is empty or not an address', () => {
    expect(draftSendCheck({ ...form, address: '' })).toEqual({ ok: false, errors: { to: 'Type the address to send to, e.g. prints@copyshop.example' } });
    const bad = draftSendCheck({ ...form, address: 'copyshop at the corner' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors.to).toMatch(/e-mail address/);
  });

  it('names the note when it is longer than the server keeps', () => {
    const checked = draftSendCheck({ ...form, note: 'x'.repeat(2001) });
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.errors).toEqual({ note: 'Note must be at most 2000 characters' });
  });
});

describe('draftSendServerErrors', () => {
  it("puts the server's field messages beside their fields", () => {
    const error = new ApiError(400, 'client_without_email', 'Marisol has no e-mail address', { to: 'Marisol has no e-mail address' });
    expect(draftSendServerErrors(error)).toEqual({ to: 'Marisol has no e-mail address' });
  });

  it('keeps a message tied to no field for the form', () => {
    expect(draftSendServerErrors(new ApiError(403, 'forbidden', 'Only an owner can send to the client'))).toEqual({ form: 'Only an owner can send to the client' });
    expect(draftSendServerErrors(new Error('offline'))).toEqual({ form: 'offline' });
  });
});
