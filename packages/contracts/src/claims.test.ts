import { describe, expect, it } from 'vitest';
import { createAppearanceSchema } from './appearances.js';
import { CLAIM_SUMMARY_MAX_LENGTH, claimQueueQuerySchema, createClaimSchema } from './claims.js';
import { createReplyAttemptSchema } from './reply-attempts.js';
import { linkSourceSchema } from './sources.js';

const paths = (result: { error?: { issues: Array<{ path: PropertyKey[] }> } }) =>
  result.error?.issues.map((issue) => issue.path.join('.')) ?? [];

const appearance = {
  url: 'https://video.marrowby.test/watch/1',
  outlet: 'Marrowby Community Radio',
  seenAt: '2026-11-28T19:30:00+00:00',
  seenTimeZone: 'Europe/London',
};

describe('claims desk schemas (the same rules as the API’s DTOs)', () => {
  it('files a claim with a new claimant, normalising topic tags', () => {
    const parsed = createClaimSchema.parse({
      text: ' The sun is getting brighter. ',
      summary: 'The sun’s brightening explains recent warming',
      topics: [' Solar ', 'attribution'],
      claimant: { name: 'Lowmoor Weather Club', kind: 'organisation' },
      firstAppearance: appearance,
    });
    expect(parsed.text).toBe('The sun is getting brighter.');
    expect(parsed.topics).toEqual(['solar', 'attribution']);
  });

  it('holds the summary to one line of 75 characters and asks for exactly one claimant', () => {
    const long = createClaimSchema.safeParse({
      text: 'x',
      summary: 'y'.repeat(CLAIM_SUMMARY_MAX_LENGTH + 1),
      topics: [],
      claimantId: '6f1c1d3e-8a5b-4c1e-9d2f-0a1b2c3d4e5f',
      claimant: { name: 'Both', kind: 'organisation' },
    });
    expect(paths(long)).toEqual(['summary', 'claimantId']);
  });

  it('refuses script and data URLs, unknown time zones and instants without an offset', () => {
    const bad = createAppearanceSchema.safeParse({
      ...appearance,
      url: 'javascript:alert(1)',
      seenTimeZone: 'Mars/Olympus',
      seenAt: '2026-11-28T19:30:00',
    });
    expect(paths(bad)).toEqual(['url', 'seenAt', 'seenTimeZone']);
  });

  it('needs a DOI or URL for a source unless it is an expert interview', () => {
    const source = { title: 'T', kind: 'agency_dataset', grade: 'strong', gradeReason: 'Primary' };
    expect(paths(linkSourceSchema.safeParse({ source }))).toContain('source.url');
    expect(
      linkSourceSchema.safeParse({ source: { ...source, kind: 'expert_interview' } }).success,
    ).toBe(true);
    expect(
      linkSourceSchema.safeParse({ source: { ...source, doi: '10.1029/98GL01908' } }).success,
    ).toBe(true);
  });

  it('needs the reply text when the claimant replied', () => {
    const attempt = {
      contacted: 'Press office',
      contactedAt: '2026-11-29T09:00:00Z',
      channel: 'email',
      outcome: 'replied',
    };
    expect(paths(createReplyAttemptSchema.safeParse(attempt))).toEqual(['reply']);
    expect(
      createReplyAttemptSchema.safeParse({ ...attempt, reply: 'We stand by it.' }).success,
    ).toBe(true);
  });

  it('reads the queue’s URL parameters into typed filters', () => {
    expect(
      claimQueueQuerySchema.parse({ mine: 'true', legal: 'false', page: '3', status: 'filed' }),
    ).toEqual({
      mine: true,
      legal: false,
      page: 3,
      status: 'filed',
    });
    expect(
      paths(claimQueueQuerySchema.safeParse({ pageSize: '500', assignee: 'someone' })),
    ).toEqual(['assignee', 'pageSize']);
  });
});
