import type { IncomingMessage } from 'node:http';
import { HttpError } from './httpError.ts';

/** Largest request body the server reads, bytes (a dial spec is about 2 KiB; 256 KiB leaves ample room). */
export const MAX_BODY_BYTES = 256 * 1024;

/**
 * Read a JSON request body of at most `limitBytes`. Refuses early, from the
 * Content-Length header, when it announces more, and stops reading as soon as
 * the bytes received pass the limit (413 Payload Too Large, RFC 9110 §15.5.14);
 * a body that is not `application/json` is 415, one that does not parse is 400
 * (a leading UTF-8 byte order mark is skipped). A body that stops arriving
 * (the server's request timeout, or the client gone) is a `BodyAbortedError`.
 * The caller sends the error response and closes the connection.
 */
export async function readJsonBody(req: IncomingMessage, limitBytes: number = MAX_BODY_BYTES): Promise<unknown> {
  const type = String(req.headers['content-type'] ?? '').split(';')[0].trim().toLowerCase();
  if (type !== 'application/json') throw new HttpError(415, `request body: content type ${JSON.stringify(type)}; allowed: application/json`);
  const announced = Number(req.headers['content-length'] ?? NaN);
  if (Number.isFinite(announced) && announced > limitBytes) throw tooLarge(announced, limitBytes);
  const chunks: Buffer[] = [];
  let size = 0;
  try {
    for await (const chunk of req as AsyncIterable<Buffer>) {
      size += chunk.length;
      if (size > limitBytes) throw tooLarge(size, limitBytes);
      chunks.push(chunk);
    }
  } catch (e) {
    if (e instanceof HttpError) throw e;
    throw new BodyAbortedError(`${req.method} ${req.url}: the request body stopped after ${size} bytes (${(e as Error).message})`);
  }
  // A UTF-8 byte order mark is allowed before the JSON text (RFC 8259 §8.1: a parser MAY ignore it; some clients send one).
  const text = Buffer.concat(chunks).toString('utf8').replace(/^\uFEFF/, '');
  try {
    return JSON.parse(text);
  } catch {
    throw new HttpError(400, 'request body: not valid JSON');
  }
}

/** The request body did not arrive in full: the server timed it out or the client closed the connection. Nothing to answer. */
export class BodyAbortedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BodyAbortedError';
  }
}

function tooLarge(size: number, limit: number): HttpError {
  return new HttpError(413, `request body: ${size} bytes or more; allowed: at most ${limit} bytes`);
}
