/** HTTP for the bench: timed requests over keep-alive that report the bytes as sent on the wire. */
import http from 'node:http';
import { performance } from 'node:perf_hooks';
import { brotliDecompressSync, gunzipSync, inflateSync } from 'node:zlib';

const agent = new http.Agent({ keepAlive: true, maxSockets: 64 });

export interface BenchResponse {
  status: number;
  headers: http.IncomingHttpHeaders;
  /** Body bytes as received (compressed when the server compressed them). */
  wireBytes: number;
  /** The decoded body. */
  body: Buffer;
  /** From sending the request to the last body byte. */
  ms: number;
}

export interface BenchRequest {
  method?: string;
  path: string;
  headers?: Record<string, string>;
  body?: Buffer | string;
}

function decode(encoding: string | undefined, raw: Buffer): Buffer {
  if (encoding === 'br') return brotliDecompressSync(raw);
  if (encoding === 'gzip') return gunzipSync(raw);
  if (encoding === 'deflate') return inflateSync(raw);
  return raw;
}

export function request(baseUrl: string, req: BenchRequest): Promise<BenchResponse> {
  const url = new URL(req.path, baseUrl);
  return new Promise((resolve, reject) => {
    const started = performance.now();
    const r = http.request(
      url,
      {
        method: req.method ?? 'GET',
        agent,
        headers: {
          'accept-encoding': 'br, gzip',
          origin: new URL(baseUrl).origin,
          ...(req.body !== undefined ? { 'content-length': String(Buffer.byteLength(req.body)) } : {}),
          ...req.headers,
        },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => {
          const ms = performance.now() - started;
          const raw = Buffer.concat(chunks);
          try {
            resolve({
              status: res.statusCode ?? 0,
              headers: res.headers,
              wireBytes: raw.length,
              body: decode(res.headers['content-encoding'], raw),
              ms,
            });
          } catch (error) {
            reject(error as Error);
          }
        });
        res.on('error', reject);
      },
    );
    r.on('error', reject);
    if (req.body !== undefined) r.write(req.body);
    r.end();
  });
}

/** The request, failing unless it answers `expected`. */
export async function expectStatus(
  baseUrl: string,
  req: BenchRequest,
  expected: number | number[],
): Promise<BenchResponse> {
  const res = await request(baseUrl, req);
  const ok = Array.isArray(expected) ? expected.includes(res.status) : res.status === expected;
  if (!ok) {
    throw new Error(
      `${req.method ?? 'GET'} ${req.path} answered ${res.status}: ${res.body.toString('utf8').slice(0, 300)}`,
    );
  }
  return res;
}

export function json(body: unknown): { headers: Record<string, string>; body: string } {
  return { headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) };
}

/** Signs in and returns the Cookie header of the session. */
export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
  const res = await expectStatus(
    baseUrl,
    { method: 'POST', path: '/api/auth/sign-in', ...json({ email, password }) },
    200,
  );
  const cookies = res.headers['set-cookie'] ?? [];
  if (cookies.length === 0) throw new Error(`Signing in as ${email} set no cookie.`);
  return cookies.map((c) => c.split(';')[0]).join('; ');
}

export function closeAgent(): void {
  agent.destroy();
}
