import {
  GetObjectCommand,
  HeadObjectCommand,
  NoSuchKey,
  NotFound,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { Readable } from 'node:stream';
import { type StorageConfig } from '../config/configuration';
import { StoredFileMissingError, type FileStorage } from './file-storage';

/** Files in an S3 bucket (or anything that speaks its API), under an optional key prefix. */
export class S3FileStorage implements FileStorage {
  private readonly client: S3Client;

  constructor(private readonly config: StorageConfig['s3']) {
    this.client = new S3Client({
      region: config.region,
      endpoint: config.endpoint,
      forcePathStyle: config.forcePathStyle,
      credentials: config.credentials,
      // The SDK's default trailing checksums (aws-chunked uploads) are not understood by
      // many S3-compatible stores, s3rver among them; the desk keeps its own SHA-256.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
  }

  async has(key: string): Promise<boolean> {
    try {
      await this.client.send(
        new HeadObjectCommand({ Bucket: this.config.bucket, Key: this.keyOf(key) }),
      );
      return true;
    } catch (error) {
      if (error instanceof NotFound || error instanceof NoSuchKey) return false;
      throw error;
    }
  }

  async putFile(key: string, path: string, mediaType: string): Promise<void> {
    // A single PUT is all or nothing: S3 never shows a partly written object.
    const { size } = await stat(path);
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.config.bucket,
        Key: this.keyOf(key),
        Body: createReadStream(path),
        ContentLength: size,
        ContentType: mediaType,
      }),
    );
  }

  async open(key: string): Promise<Readable> {
    try {
      const object = await this.client.send(
        new GetObjectCommand({ Bucket: this.config.bucket, Key: this.keyOf(key) }),
      );
      if (!(object.Body instanceof Readable)) throw new Error(`S3 sent no stream for ${key}`);
      return object.Body;
    } catch (error) {
      if (error instanceof NoSuchKey || error instanceof NotFound) {
        throw new StoredFileMissingError(key);
      }
      throw error;
    }
  }

  private keyOf(key: string): string {
    return this.config.prefix ? `${this.config.prefix.replace(/\/$/, '')}/${key}` : key;
  }
}
