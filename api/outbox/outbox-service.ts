// The outbox: every message the local fake mail server caught, read back from its .eml files.
import { existsSync } from 'node:fs';
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import { AppError } from '../http/app-error.js';

export interface OutboxMessage {
  id: string;
  date: string | null;
  from: string;
  to: string;
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number }[];
}

const safeName = /^[\w.-]+\.eml$/;

export async function listOutbox(folder: string, limit = 200): Promise<OutboxMessage[]> {
  if (!existsSync(folder)) return [];
  const names = (await readdir(folder)).filter((name) => safeName.test(name)).sort().reverse().slice(0, limit);
  return Promise.all(names.map((name) => readMessage(folder, name)));
}

export async function readMessage(folder: string, id: string): Promise<OutboxMessage> {
  // Only our own generated names: nothing from the URL can walk out of the folder.
  if (!safeName.test(id) || !existsSync(join(folder, id))) throw AppError.notFound('No such message.');
  const parsed = await simpleParser(await readFile(join(folder, id)));
  const addresses = (value: typeof parsed.to) => (Array.isArray(value) ? value : value ? [value] : []).map((a) => a.text).join(', ');
  return {
    id,
    date: parsed.date?.toISOString() ?? null,
    from: parsed.from?.text ?? '',
    to: addresses(parsed.to),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? 'attachment', contentType: a.contentType, size: a.size })),
  };
}

export async function readAttachment(folder: string, id: string, index: number): Promise<{ filename: string; contentType: string; content: Buffer }> {
  if (!safeName.test(id) || !existsSync(join(folder, id))) throw AppError.notFound('No such message.');
  const parsed = await simpleParser(await readFile(join(folder, id)));
  const attachment = parsed.attachments[index];
  if (!attachment) throw AppError.notFound('No such attachment.');
  return { filename: attachment.filename ?? 'attachment', contentType: attachment.contentType, content: attachment.content };
}
