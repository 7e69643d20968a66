import { s3Storage } from '@/server/lib/storage';
import { startFakeS3 } from './support/fake-s3';

describe('documents in a hosted object store', () => {
  it('puts, gets and deletes objects through the AWS SDK against a local S3 stand-in', async () => {
    const fake = await startFakeS3();
    try {
      const storage = s3Storage({ bucket: 'ritorno-docs', region: 'eu-west-2', endpoint: fake.endpoint, accessKeyId: 'test', secretAccessKey: 'test', forcePathStyle: true });
      const body = Buffer.from('%PDF-1.7 letter');
      await storage.put('doc-1.pdf', body, 'application/pdf');
      expect(fake.objects.get('/ritorno-docs/doc-1.pdf')).toEqual(body);
      expect(await storage.get('doc-1.pdf')).toEqual(body);
      await storage.delete('doc-1.pdf');
      expect(fake.objects.size).toBe(0);
      await expect(storage.get('doc-1.pdf')).rejects.toThrow();
      await expect(storage.put('../escape', body, 'application/pdf')).rejects.toThrow();
    } finally {
      await fake.close();
    }
  });
});
