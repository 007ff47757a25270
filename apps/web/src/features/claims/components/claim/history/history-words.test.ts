import type { ClaimHistoryEvent } from '@skyledger/contracts';
import { describe, expect, it } from 'vitest';
import { describeAction, describeDetails } from './history-words';

const editor = { id: 'u-1', displayName: 'Tamsin Ferrow' };
const event = (action: string, summary: Record<string, unknown>): ClaimHistoryEvent => ({
  id: 'e-1',
  action,
  entityType: action.split('.')[0]!,
  entityId: 'x',
  actor: editor,
  summary,
  at: '2026-11-30T10:15:00.000Z',
});

describe('history in words', () => {
  it('tells taking a claim from giving it to someone', () => {
    const taken = event('claim.assigned', {
      assignee: { from: null, to: 'u-1' },
      assigneeName: 'Tamsin Ferrow',
    });
    expect(describeAction(taken)).toBe('took the claim to research');
    const given = { ...taken, actor: { id: 'u-2', displayName: 'Morwenna Hale' } };
    expect(describeAction(given)).toBe('gave the claim to Tamsin Ferrow');
  });

  it('names the parts of a claim and the claim life', () => {
    expect(describeAction(event('reply_attempt.added', {}))).toBe('added a reply attempt');
    expect(describeAction(event('source.linked', {}))).toBe('cited a source');
    expect(describeAction(event('claim.set_aside', {}))).toBe('moved the claim to “Set aside”');
  });

  it('tells the verdict, sign-off and publishing steps apart', () => {
    expect(describeAction(event('verdict.drafted', {}))).toBe('drafted a version of the verdict');
    expect(describeAction(event('working.rerun', {}))).toBe('reran a working');
    expect(describeAction(event('claim.scheduled', {}))).toBe(
      'scheduled the explainer’s publication',
    );
    expect(describeAction(event('claim.schedule_cancelled', {}))).toBe(
      'cancelled the scheduled publication',
    );
    expect(describeAction(event('claim.published', {}))).toBe('published the explainer');
    expect(describeAction(event('claim.published', { note: { kind: 'correction' } }))).toBe(
      'published the corrected explainer',
    );
  });

  it('writes codes in the desk’s words and changes as before → after', () => {
    expect(
      describeDetails(
        event('source.updated', {
          grade: { from: 'adequate', to: 'weak' },
          kind: 'peer_reviewed_paper',
          size: 18_842,
          topics: ['solar', 'attribution'],
        }),
      ),
    ).toEqual([
      'grade: Adequate → Weak',
      'kind: Peer-reviewed paper',
      'size: 18 KB',
      'topics: solar, attribution',
    ]);
  });
});
