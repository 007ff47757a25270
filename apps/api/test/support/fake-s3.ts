import { mkdtemp, rm } from 'node:fs/promises';
import { join } from 'node:path';
import S3rver from 's3rver';

export interface FakeS3 {
  /** The environment that points the API's S3 storage at this server. */
  env: Record<string, string>;
  endpoint: string;
  bucket: string;
  stop(): Promise<void>;
}

/**
 * A local stand-in for S3 (s3rver, in-process, on 127.0.0.1 and a free port), with one
 * bucket, keeping its objects under the repository's ignored tmp folder.
 */
export async function startFakeS3(bucket = 'skyledger-evidence'): Promise<FakeS3> {
  const directory = await mkdtemp(join(__dirname, '../../../../tmp', 's3rver-'));
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: bucket }],
  });
  const { port } = (await server.run()) as { port: number };
  const endpoint = `http://127.0.0.1:${port}`;
  return {
    endpoint,
    bucket,
    env: {
      FILES_STORAGE: 's3',
      S3_BUCKET: bucket,
      S3_ENDPOINT: endpoint,
      S3_REGION: 'us-east-1',
      S3_FORCE_PATH_STYLE: 'true',
      // s3rver's fixed development credentials.
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    },
    async stop() {
      await server.close();
      await rm(directory, { recursive: true, force: true });
    },
  };
}
