import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { type ClaimDetail } from '@skyledger/contracts';
import { readdir } from 'node:fs/promises';
import { asBytes, onePixelPng } from './support/evidence-files';
import { startFakeS3, type FakeS3 } from './support/fake-s3';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

describe('evidence files stored in S3 (against s3rver, a local fake of S3)', () => {
  let s3: FakeS3;
  let t: TestApp;
  let token: string;
  let claim: ClaimDetail;

  beforeAll(async () => {
    s3 = await startFakeS3();
    t = await createTestApp('attachments_s3', { ...s3.env, S3_PREFIX: 'desk' });
    const reporter = await t.addUser('reporter', 'reporter@s3.test');
    token = (await t.signIn(reporter.email, testPassword)).accessToken;
    claim = (
      await t
        .http()
        .post('/api/claims')
        .set('Authorization', `Bearer ${token}`)
        .send({
          text: 'The ice on Lowmoor Tarn freezes later every year because of the new road.',
          summary: 'Lowmoor Tarn freezes later because of the new road',
          topics: ['ice'],
          claimant: { name: 'Lowmoor Anglers', kind: 'organisation' },
        })
    ).body;
  });
  afterAll(async () => {
    await t.close();
    await s3.stop();
  });

  it('puts the bytes in the bucket once, under their SHA-256, and streams them back', async () => {
    const send = (name: string) =>
      t
        .http()
        .post(`/api/claims/${claim.id}/attachments`)
        .set('Authorization', `Bearer ${token}`)
        .attach('file', onePixelPng, name);
    const first = await send('tarn.png');
    const second = await send('tarn-again.png');
    expect([first.status, second.status]).toEqual([201, 201]);

    const client = new S3Client({
      region: 'us-east-1',
      endpoint: s3.endpoint,
      forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    });
    const listed = await client.send(new ListObjectsV2Command({ Bucket: s3.bucket }));
    const sha = first.body.sha256 as string;
    expect(listed.Contents?.map((object) => object.Key)).toEqual([
      `desk/sha256/${sha.slice(0, 2)}/${sha}`,
    ]);
    // Nothing went to the local store, and the staging folder is empty again.
    expect(await readdir(`${t.filesDir}/.incoming`)).toEqual([]);

    const download = await t
      .http()
      .get(`/api/attachments/${second.body.id}`)
      .set('Authorization', `Bearer ${token}`)
      .buffer(true)
      .parse(asBytes);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(download.body as Buffer, onePixelPng)).toBe(0);
  });
});
