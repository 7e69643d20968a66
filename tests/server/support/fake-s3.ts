import http from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A local stand-in for an S3-compatible object store (path-style PUT, GET and DELETE of objects), so the
 * storage module's hosted-store code runs through the real AWS SDK without a network. Signatures are
 * not checked: that is the real service's job.
 */
export async function startFakeS3(): Promise<{ endpoint: string; objects: Map<string, Buffer>; close: () => Promise<void> }> {
  const objects = new Map<string, Buffer>();
  const server = http.createServer((req, res) => {
    const key = decodeURIComponent((req.url ?? '').split('?')[0] ?? '');
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      if (req.method === 'PUT') {
        objects.set(key, Buffer.concat(chunks));
        res.writeHead(200, { etag: '"fake"' }).end();
      } else if (req.method === 'GET' && objects.has(key)) {
        const body = objects.get(key) ?? Buffer.alloc(0);
        res.writeHead(200, { 'content-length': body.length, 'content-type': 'application/octet-stream' }).end(body);
      } else if (req.method === 'DELETE') {
        objects.delete(key);
        res.writeHead(204).end();
      } else {
        res.writeHead(404, { 'content-type': 'application/xml' }).end('<Error><Code>NoSuchKey</Code></Error>');
      }
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const { port } = server.address() as AddressInfo;
  return { endpoint: `http://127.0.0.1:${port}`, objects, close: () => new Promise((resolve) => server.close(() => resolve())) };
}
