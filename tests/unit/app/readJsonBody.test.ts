import { describe, expect, it } from 'vitest';
import { ApiError } from '@/app/lib/errors';
import { MAX_JSON_BODY_BYTES, readJsonBody } from '@/app/lib/readJsonBody';

function post(body: BodyInit, headers: Record<string, string> = {}) {
  return new Request('http://127.0.0.1/api/x', { method: 'POST', body, headers, duplex: 'half' } as RequestInit);
}

async function statusOf(p: Promise<unknown>): Promise<number> {
  try {
    await p;
    return 200;
  } catch (e) {
    expect(e).toBeInstanceOf(ApiError);
    return (e as ApiError).status;
  }
}

describe('readJsonBody', () => {
  it('parses a JSON object', async () => {
    expect(await readJsonBody(post('{"a":1,"b":"é"}'))).toEqual({ a: 1, b: 'é' });
  });

  it('malformed JSON is 400, an empty body is 400', async () => {
    expect(await statusOf(readJsonBody(post('{"a":')))).toBe(400);
    expect(await statusOf(readJsonBody(post('')))).toBe(400);
  });

  it('a body over the limit is 413 even without a Content-Length', async () => {
    const big = JSON.stringify({ a: 'x'.repeat(MAX_JSON_BODY_BYTES) });
    const stream = new ReadableStream<Uint8Array>({
      start(controller) {
        controller.enqueue(new TextEncoder().encode(big));
        controller.close();
      },
    });
    expect(await statusOf(readJsonBody(post(stream)))).toBe(413);
  });

  it('a declared Content-Length over the limit is 413 before reading', async () => {
    expect(await statusOf(readJsonBody(post('{}', { 'content-length': String(MAX_JSON_BODY_BYTES + 1) })))).toBe(413);
  });

  it('exactly at the limit is accepted', async () => {
    const padding = MAX_JSON_BODY_BYTES - '{"a":""}'.length;
    const body = `{"a":"${'y'.repeat(padding)}"}`;
    expect(new TextEncoder().encode(body).length).toBe(MAX_JSON_BODY_BYTES);
    const v = (await readJsonBody(post(body))) as { a: string };
    expect(v.a.length).toBe(padding);
  });
});
