import { MEASUREMENT_FIELDS } from '../../shared/schemas/measurement.js';
import type { DeliveryView, DraftSendInput, MeasurementsSendInput, SendKind } from '../../shared/schemas/mail.js';
import { lengthFormat } from '../../shared/units/index.js';
import { AppError, Forbidden } from '../lib/errors.js';
import { Studio, User, type Client } from '../models/index.js';
import { dateWords, mailCompose } from '../mail/compose.js';
import { mailSend } from '../mail/send.js';
import type { Mailer } from '../mail/transport.js';
import { clientFind } from './clients.js';
import type { ServiceContext } from './context.js';
import { draftPdfBuild } from './draft-pdf.js';
import { measurementSetList } from './measurements.js';

const DOCUMENT_WORDS: Record<SendKind, { name: string; use: string }> = {
  tiles: {
    name: 'the pattern on tiled pages',
    use: 'Print every page at 100 % (actual size, never "fit to page"), check the test squares with a ruler, then trim and tape the pages edge to edge by their labels and marks.',
  },
  sheet: {
    name: 'the pattern on one wide sheet',
    use: 'For the copy shop: print at 100 % (actual size, no scaling) on the paper named on the sheet, then check the test squares with a ruler.',
  },
  ticket: {
    name: 'the cutting ticket',
    use: 'The ticket lists the pieces and how many to cut, the fold layout, the fabric needed, the binding strips and the finishing steps. Take care with rotary cutters and overlocker blades, and follow your workshop\'s own safety rules.',
  },
};

async function sender(c: ServiceContext): Promise<{ studioName: string; member: User }> {
  const [studio, member] = await Promise.all([
    Studio.findByPk(c.studioId, { attributes: ['name'] }),
    User.findOne({ where: { id: c.userId, studioId: c.studioId }, attributes: ['name', 'email'] }),
  ]);
  if (!studio || !member) throw new Forbidden();
  return { studioName: studio.name, member };
}

function clientAddress(client: Client): string {
  if (!client.email) {
    const message = `${client.name} has no e-mail address: add one on the client's page first.`;
    throw new AppError(400, 'client_without_email', message, { to: message });
  }
  return client.email;
}

function deliveryView(d: { id: number; kind: DeliveryView['kind']; toAddress: string; subject: string; status: DeliveryView['status']; error: string | null; createdAt: Date }, sentBy: string): DeliveryView {
  return { id: d.id, kind: d.kind, to: d.toAddress, subject: d.subject, status: d.status, error: d.error, sentBy, sentAt: d.createdAt.toISOString(), messageId: null };
}

/**
 * E-mails a client the measurements of their latest fitting (the current version of the newest
 * set), in the studio's unit: inches to 1/8 in or centimetres to 1 mm. Recorded on the client.
 */
export async function measurementsSend(c: ServiceContext, mailer: Mailer, clientId: number, input: MeasurementsSendInput): Promise<DeliveryView> {
  const client = await clientFind(c, clientId);
  const to = clientAddress(client);
  const { items } = await measurementSetList(c, clientId);
  const latest = items[0];
  if (!latest) throw new AppError(409, 'no_measurements', `${client.name} has no measurement set yet: take their measurements first.`);
  const values = latest.valuesMm as Partial<Record<string, number>>;
  const rows = MEASUREMENT_FIELDS.flatMap((f): [string, string][] => {
    const mm = values[f.key];
    return mm === undefined ? [] : [[f.label, lengthFormat(mm, c.unit)]];
  });
  const { studioName, member } = await sender(c);
  const unitWords = c.unit === 'in' ? 'inches, to the nearest 1/8 in' : 'centimetres, to the nearest millimetre';
  const body = mailCompose({
    greeting: `Hello ${client.name},`,
    paragraphs: [`Here are the body measurements ${studioName} took at your fitting on ${dateWords(latest.takenAt)}, in ${unitWords}.`],
    note: input.note,
    table: { caption: `Measurements of ${dateWords(latest.takenAt)}`, rows },
    after: ['Keep them for your records. If anything looks wrong, reply to this message.'],
    signature: studioName,
  });
  const delivery = await mailSend(mailer, {
    studioId: c.studioId,
    studioName,
    kind: 'measurements',
    to,
    replyTo: member.email,
    subject: `Your measurements from ${studioName}`,
    ...body,
    clientId: client.id,
    sentBy: c.userId,
  });
  return deliveryView(delivery, member.name);
}

/**
 * E-mails one of a draft's documents as a PDF attachment: to the draft's client (owners only,
 * since only owners see clients' addresses) or to any address, such as a copy shop's. Recorded
 * on the draft and its client.
 */
export async function draftSend(c: ServiceContext, mailer: Mailer, draftId: number, input: DraftSendInput, today: string): Promise<DeliveryView> {
  const forClient = input.to === 'client';
  if (forClient && c.role !== 'owner') throw new Forbidden("Only an owner can send to the client's own address: type the address to send to instead.");
  // Another address (a copy shop) gets the pattern without the client's name on it.
  const pdf = await draftPdfBuild(c, draftId, { kind: input.kind, paper: input.paper, today, withClientName: forClient });
  const to = forClient ? clientAddress(await clientFind(c, pdf.clientId)) : (input.to as string);
  const { studioName, member } = await sender(c);
  const words = DOCUMENT_WORDS[input.kind];
  const pages = `${pdf.pageCount} ${pdf.pageCount === 1 ? 'page' : 'pages'}, PDF`;
  const body = mailCompose({
    greeting: forClient ? `Hello ${pdf.clientName},` : 'Hello,',
    paragraphs: [`Attached is ${words.name} for ${forClient ? 'your ' : ''}${pdf.styleName} (${pages}), from draft ${draftId} of ${studioName}.`, words.use],
    note: input.note,
    after: ['Questions about it? Reply to this message.'],
    signature: studioName,
  });
  const delivery = await mailSend(mailer, {
    studioId: c.studioId,
    studioName,
    kind: input.kind,
    to,
    replyTo: member.email,
    subject: `${pdf.styleName}, draft ${draftId}: ${words.name.replace(/^the /, '')}`,
    ...body,
    attachments: [{ filename: pdf.fileName, content: pdf.bytes, contentType: 'application/pdf' }],
    clientId: pdf.clientId,
    draftId,
    sentBy: c.userId,
  });
  return deliveryView(delivery, member.name);
}
