import type {
  AuditEventView,
  ChecklistItem,
  ClaimVerdictView,
  NotificationSettingsView,
  OutboxMessageView,
  OutboxPage,
  Page,
  RatingLevelView,
  SignoffView,
  VerdictVersionView,
} from '@skyledger/contracts';
import { notificationKindLabels, notificationKinds } from '@skyledger/contracts';
import { coreClaim } from './claim-fixtures';
import { deskPeople } from './fixtures';

// The invented Marrowby Gazette desk's verdict on the core-heat claim.
const ref = (person: { id: string; displayName: string }) => ({
  id: person.id,
  displayName: person.displayName,
});
const { science_editor: editor, copy_desk: copy, desk_chief: chief } = deskPeople;

export const verdictPath = `/api/claims/${coreClaim.id}/verdict`;
export const signoffPath = `/api/claims/${coreClaim.id}/signoff`;
export const transitionsPath = `/api/claims/${coreClaim.id}/transitions`;

export const ratingLevels: RatingLevelView[] = [
  ['holds-up', 1, 'Holds up', 'The claim matches the best available evidence.'],
  ['stretched', 3, 'Stretched', 'Starts from something real but goes further than the evidence.'],
  ['contradicted', 5, 'Contradicted by evidence', 'Reliable evidence shows the claim is wrong.'],
  ['not-checkable', null, 'Not checkable', 'An opinion, a forecast, or nothing testable.'],
].map(([id, number, label, description]) => ({
  id: id as string,
  number: number as number | null,
  label: label as string,
  description: description as string,
  isRating: number !== null,
  inUse: id === 'contradicted',
  version: 2,
}));

const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

export const draftVersion: VerdictVersionView = {
  id: '9c1d2e3f-4a5b-4c6d-8e7f-700000000001',
  number: 1,
  state: 'draft',
  ratingId: null,
  bottomLine: 'The interior gives off far less heat than greenhouse gases hold in.',
  body: {
    type: 'doc',
    content: [
      {
        type: 'heading',
        attrs: { level: 2 },
        content: [{ type: 'text', text: 'What the evidence shows' }],
      },
      paragraph('Heat from the interior is tiny next to greenhouse forcing.'),
    ],
  },
  bodyHtml:
    '<h2>What the evidence shows</h2><p>Heat from the interior is tiny next to greenhouse forcing.</p>',
  primarySourceId: null,
  citedSourceIds: [],
  embeddedWorkingIds: [],
  draftedBy: ref(editor),
  lastEditedBy: ref(editor),
  createdAt: '2026-11-20T09:00:00.000Z',
  updatedAt: '2026-11-20T09:30:00.000Z',
  submittedAt: null,
  claimAsCleared: null,
  decisions: [],
  version: 3,
};

export const verdictWith = (...versions: VerdictVersionView[]): ClaimVerdictView => ({
  versions,
  conflicts: [],
});

const sourceId = coreClaim.sources[0]!.id;

/** Version 2, submitted; version 1 was sent back with a note. */
export const sentBackVersion: VerdictVersionView = {
  ...draftVersion,
  state: 'sent_back',
  ratingId: 'contradicted',
  primarySourceId: sourceId,
  submittedAt: '2026-11-20T10:00:00.000Z',
  decisions: [
    {
      id: 'd1',
      versionId: draftVersion.id,
      decision: 'sent_back',
      notes: 'Say how sure the science is.',
      by: ref(copy),
      at: '2026-11-20T11:00:00.000Z',
      checklist: [],
    },
  ],
};

export const submittedVersion: VerdictVersionView = {
  ...draftVersion,
  id: '9c1d2e3f-4a5b-4c6d-8e7f-700000000002',
  number: 2,
  state: 'submitted',
  ratingId: 'contradicted',
  primarySourceId: sourceId,
  bottomLine: 'The interior gives off about thirty times less heat than greenhouse gases hold in.',
  body: {
    type: 'doc',
    content: [
      paragraph(
        'Heat from the interior is very likely (90–100 %) tiny next to greenhouse forcing.',
      ),
    ],
  },
  bodyHtml: `<p>Heat from the interior is very likely (90–100 %) tiny next to greenhouse forcing.<a class="citation" data-source-id="${sourceId}" href="#source-${sourceId}">[1]</a></p>`,
  citedSourceIds: [sourceId],
  submittedAt: '2026-11-21T09:00:00.000Z',
  version: 5,
};

export const checklist = (open: ChecklistItem['key'][] = []): ChecklistItem[] =>
  (
    [
      ['verdictComplete', 'Rating, bottom line and explainer written', 'All three are there'],
      ['primarySource', 'A primary source for the central finding', 'Heat flow (strong)'],
      ['rightOfReply', 'Right of reply logged or waived', '1 attempt logged'],
      ['workingsRecomputed', 'Every working recomputed by the server', 'All 2 unchanged'],
      ['legalReview', 'Legal-review flag cleared', 'Not flagged'],
    ] as const
  ).map(([key, label, detail]) => ({
    key,
    label,
    done: !open.includes(key),
    detail: open.includes(key) ? `Open: ${label.toLowerCase()}` : detail,
  }));

export const signoffView = (overrides: Partial<SignoffView> = {}): SignoffView => ({
  version: submittedVersion,
  previous: sentBackVersion,
  checklist: checklist(),
  mayDecide: true,
  whyNot: null,
  ...overrides,
});

export const awaitingClaim = { ...coreClaim, status: 'awaiting_signoff' as const, version: 6 };

const mail = (overrides: Partial<OutboxMessageView>): OutboxMessageView => ({
  id: '5a6b7c8d-9e0f-4a1b-8c2d-800000000001',
  kind: 'signoff_requested',
  to: copy.email,
  subject: `For sign-off: ${coreClaim.summary}`,
  state: 'sent',
  attempts: 1,
  lastError: null,
  nextAttemptAt: '2026-11-21T09:00:00.000Z',
  sentAt: '2026-11-21T09:00:02.000Z',
  createdAt: '2026-11-21T09:00:00.000Z',
  ...overrides,
});

export const failedMail = mail({
  id: '5a6b7c8d-9e0f-4a1b-8c2d-800000000002',
  kind: 'sent_back',
  to: editor.email,
  subject: `Sent back: ${coreClaim.summary}`,
  state: 'failed',
  attempts: 8,
  lastError: 'connect ECONNREFUSED 127.0.0.1:1025',
  sentAt: null,
});

export const outboxPage = (items: OutboxMessageView[] = [mail({}), failedMail]): OutboxPage => ({
  items,
  total: items.length,
  page: 1,
  pageSize: 50,
  counts: { pending: 0, sending: 0, sent: 1, failed: 1 },
});

export const auditPage: Page<AuditEventView> = {
  items: [
    {
      id: 'a1',
      at: '2026-11-21T09:00:00.000Z',
      actor: ref(copy),
      action: 'claim.cleared',
      entityType: 'claim',
      entityId: coreClaim.id,
      claimId: coreClaim.id,
      summary: { status: { from: 'awaiting_signoff', to: 'cleared' } },
    },
    {
      id: 'a2',
      at: '2026-11-20T09:00:00.000Z',
      actor: ref(chief),
      action: 'rating_level.updated',
      entityType: 'rating_scale',
      entityId: '00000000-0000-4000-8000-00000000a7e5',
      claimId: null,
      summary: { id: 'stretched', label: { from: 'Stretched', to: 'Overstretched' } },
    },
  ],
  total: 2,
  page: 1,
  pageSize: 50,
};

export const notificationSettings: NotificationSettingsView = {
  kinds: notificationKinds.map((kind) => ({
    kind,
    label: notificationKindLabels[kind],
    enabled: kind !== 'published',
  })),
};
