import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { uploadAttachment } from '@web/services/attachments';
import { ApiError, configureHttp } from '@web/services/http';

/** A stand-in XMLHttpRequest that records what is sent and plays back progress and an answer. */
class FakeXhr {
  static last: FakeXhr;
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: FormData | null = null;
  status = 0;
  statusText = '';
  responseText = '';
  withCredentials = false;
  upload: { onprogress: ((event: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  constructor() {
    FakeXhr.last = this;
  }
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  send(body: FormData) {
    this.body = body;
  }
  answer(status: number, body: unknown) {
    this.status = status;
    this.responseText = JSON.stringify(body);
    this.onload?.();
  }
}

const file = new File(['C1: O2 + hν -> 2 O(3P)\n'], 'notes.steps', { type: 'text/plain' });
const onUnauthorized = vi.fn();

beforeEach(() => {
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  configureHttp({ csrfToken: () => 'token-123', onUnauthorized });
});
afterEach(() => {
  vi.unstubAllGlobals();
  onUnauthorized.mockReset();
});

describe('uploadAttachment', () => {
  it('posts the file as field "file" with the CSRF header and reports progress to the end', async () => {
    const seen: number[] = [];
    const done = uploadAttachment('salt lake', file, (fraction) => seen.push(fraction));
    const xhr = FakeXhr.last;
    expect(xhr.method).toBe('POST');
    expect(xhr.url).toBe('/api/mechanisms/salt%20lake/attachments');
    expect(xhr.headers['X-CSRF-Token']).toBe('token-123');
    expect((xhr.body!.get('file') as File).name).toBe('notes.steps');
    xhr.upload.onprogress!({ lengthComputable: true, loaded: 25, total: 100 });
    xhr.upload.onprogress!({ lengthComputable: false, loaded: 50, total: 0 });
    xhr.upload.onprogress!({ lengthComputable: true, loaded: 80, total: 100 });
    xhr.answer(201, { id: 5, filename: 'notes.steps' });
    await expect(done).resolves.toMatchObject({ id: 5 });
    expect(seen).toEqual([0.25, 0.8, 1]);
  });

  it('turns a 413 into an ApiError with the server\'s code and message', async () => {
    const done = uploadAttachment('salt-lake', file);
    FakeXhr.last.answer(413, { error: { code: 'FILE_TOO_LARGE', message: 'The file is larger than 10 MB' } });
    const error = await done.catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 413, code: 'FILE_TOO_LARGE', message: 'The file is larger than 10 MB' });
  });

  it('reports a lost session once, as every other call does', async () => {
    const done = uploadAttachment('salt-lake', file);
    FakeXhr.last.answer(401, { error: { code: 'UNAUTHENTICATED', message: 'Sign in first' } });
    await expect(done).rejects.toMatchObject({ status: 401 });
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });

  it('fails with a network error when the server cannot be reached', async () => {
    const done = uploadAttachment('salt-lake', file);
    FakeXhr.last.onerror!();
    await expect(done).rejects.toMatchObject({ status: 0, code: 'NETWORK_ERROR' });
  });
});
