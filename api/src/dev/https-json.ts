import { request } from 'node:https';
import { rootCertificates } from 'node:tls';

/**
 * One JSON request over https trusting one more certificate (the fake push service's self-signed
 * one). fetch() in Node 20 takes no CA option, hence node:https.
 */
export function httpsJson<T>(
  url: string,
  ca: string,
  method: 'GET' | 'POST' = 'GET',
): Promise<{ status: number; body: T }> {
  return new Promise((resolve, reject) => {
    const req = request(url, { method, ca: [...rootCertificates, ca], timeout: 5_000 }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => {
        try {
          resolve({ status: res.statusCode ?? 0, body: JSON.parse(Buffer.concat(chunks).toString('utf8')) as T });
        } catch (error) {
          reject(error instanceof Error ? error : new Error(String(error)));
        }
      });
    });
    req.on('timeout', () => req.destroy(new Error(`no answer from ${url} within 5 s`)));
    req.on('error', reject);
    req.end();
  });
}
