import { mkdirSync } from 'node:fs';
import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import type { AppConfig } from '../config/app.config.js';

/** Where photo bytes live. One interface: a real bucket is a configuration change (S3_* variables). */
export abstract class PhotoStorage {
  abstract put(key: string, body: Buffer, contentType: string): Promise<void>;
  abstract get(key: string): Promise<Buffer>;
  abstract delete(key: string): Promise<void>;
}

/**
 * The S3 SDK a hosted deployment uses. Without S3_ENDPOINT, a local S3-compatible fake (s3rver) is
 * started on loopback with its files in the data folder, so development and tests go through the
 * same SDK calls as production.
 */
@Injectable()
export class S3PhotoStorage extends PhotoStorage implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly log = new Logger('PhotoStorage');
  private readonly config: AppConfig;
  private client!: S3Client;
  private fake?: S3rver;

  constructor(config: ConfigService) {
    super();
    this.config = config.getOrThrow<AppConfig>('app');
  }

  async onApplicationBootstrap(): Promise<void> {
    let endpoint = this.config.s3Endpoint;
    if (!endpoint) {
      mkdirSync(this.config.objectsDir, { recursive: true });
      this.fake = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: this.config.objectsDir, configureBuckets: [{ name: this.config.s3Bucket }] });
      const { port } = (await this.fake.run()) as { port: number };
      endpoint = `http://127.0.0.1:${port}`;
      this.log.log(`Local object storage (development fake) on ${endpoint}, files in ${this.config.objectsDir}`);
    }
    this.client = new S3Client({
      endpoint,
      region: this.config.s3Region,
      forcePathStyle: true,
      credentials: { accessKeyId: this.config.s3AccessKeyId, secretAccessKey: this.config.s3SecretAccessKey },
    });
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.config.s3Bucket }));
    } catch {
      await this.client.send(new CreateBucketCommand({ Bucket: this.config.s3Bucket }));
    }
  }

  async onApplicationShutdown(): Promise<void> {
    this.client?.destroy();
    await this.fake?.close();
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.config.s3Bucket, Key: key, Body: body, ContentType: contentType }));
  }

  async get(key: string): Promise<Buffer> {
    const res = await this.client.send(new GetObjectCommand({ Bucket: this.config.s3Bucket, Key: key }));
    return Buffer.from(await res.Body!.transformToByteArray());
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.config.s3Bucket, Key: key }));
  }
}
