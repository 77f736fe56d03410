import { CreateBucketCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { Readable } from 'node:stream';
import type { AppConfig } from '../config';

// The platform runs Node 20 by design; the SDK's notice about future Node 22 releases is noise here.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

/** Evidence files live in an S3-compatible bucket; locally that is the s3rver fake. */
export class ObjectStore {
  private readonly client: S3Client;

  constructor(private readonly settings: AppConfig['s3']) {
    this.client = new S3Client({
      endpoint: settings.endpoint,
      region: settings.region,
      forcePathStyle: true,
      credentials: { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey },
    });
  }

  async ensureBucket(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.settings.bucket }));
    } catch {
      await this.client.send(new CreateBucketCommand({ Bucket: this.settings.bucket }));
    }
  }

  async put(key: string, body: Buffer, mediaType: string): Promise<void> {
    await this.client.send(
      new PutObjectCommand({ Bucket: this.settings.bucket, Key: key, Body: body, ContentType: mediaType }),
    );
  }

  async get(key: string): Promise<Readable> {
    const answer = await this.client.send(new GetObjectCommand({ Bucket: this.settings.bucket, Key: key }));
    return answer.Body as Readable;
  }

  async getBuffer(key: string): Promise<Buffer> {
    const chunks: Buffer[] = [];
    for await (const chunk of await this.get(key)) chunks.push(Buffer.from(chunk));
    return Buffer.concat(chunks);
  }

  destroy(): void {
    this.client.destroy();
  }
}
