import {
  claimStatuses,
  type ClaimDetail,
  type ClaimListItem,
  type ClaimQueueResponse,
  type ClaimStatus,
  type ClaimantView,
  type DeskPerson,
} from '@skyledger/contracts';
import { deskPeople } from './fixtures';

// Invented claims, claimants and outlets around the fictional Marrowby Gazette.
const { reporter, science_editor: editor, desk_chief: chief, copy_desk: copy } = deskPeople;
const ref = (person: { id: string; displayName: string }) => ({
  id: person.id,
  displayName: person.displayName,
});

export const councillor: ClaimantView = {
  id: '3b0c6a52-1d7e-4c55-9a8e-2c0000000001',
  name: 'Cllr Edwin Threlkeld',
  kind: 'public_figure',
  affiliation: 'Marrowby Borough Council',
  notes: null,
  nameShownPublicly: true,
  version: 1,
};

export const weatherClub: ClaimantView = {
  id: '3b0c6a52-1d7e-4c55-9a8e-2c0000000002',
  name: 'Lowmoor Weather Club',
  kind: 'organisation',
  affiliation: null,
  notes: null,
  nameShownPublicly: true,
  version: 1,
};

export const deskPeopleList: DeskPerson[] = [chief, editor, copy, reporter].map((person) => ({
  id: person.id,
  displayName: person.displayName,
  role: person.role,
}));

export const coreClaimId = '5d2e7f10-6a3b-4b8c-8d1e-3f0000000001';
export const solarClaimId = '5d2e7f10-6a3b-4b8c-8d1e-3f0000000002';

export const queueItems: ClaimListItem[] = [
  {
    id: coreClaimId,
    summary: 'Earth’s core, not greenhouse gases, is warming the planet',
    status: 'in_research',
    topics: ['attribution', 'geothermal'],
    legalReview: false,
    claimant: { id: councillor.id, name: councillor.name, kind: councillor.kind },
    assignee: ref(editor),
    filedBy: ref(reporter),
    filedAt: '2026-11-12T20:05:00.000Z',
    updatedAt: '2026-11-18T09:30:00.000Z',
  },
  {
    id: solarClaimId,
    summary: 'The sun’s brightening explains recent warming',
    status: 'filed',
    topics: ['solar'],
    legalReview: true,
    claimant: { id: weatherClub.id, name: weatherClub.name, kind: weatherClub.kind },
    assignee: null,
    filedBy: ref(reporter),
    filedAt: '2026-11-28T19:45:00.000Z',
    updatedAt: '2026-11-28T19:45:00.000Z',
  },
];

export function countsOf(
  partial: Partial<Record<ClaimStatus, number>>,
): Record<ClaimStatus, number> {
  return Object.fromEntries(
    claimStatuses.map((status) => [status, partial[status] ?? 0]),
  ) as Record<ClaimStatus, number>;
}

export function queueOf(
  items: ClaimListItem[],
  counts = countsOf({ filed: 1, in_research: 1 }),
): { status: number; body: ClaimQueueResponse } {
  const total = Object.values(counts).reduce((sum, count) => sum + count, 0);
  return { status: 200, body: { items, total, page: 1, pageSize: 25, counts } };
}

export const coreClaim: ClaimDetail = {
  ...queueItems[0]!,
  text: 'Everybody forgets the planet has a molten core. That heat is coming up through the ground, and that is what is warming us, not the cars on the bypass.',
  claimant: councillor,
  setAsideReason: null,
  setAsideNote: null,
  version: 4,
  appearances: [
    {
      id: '6e3f8a21-7b4c-4c9d-9e2f-400000000001',
      url: 'https://webcasts.marrowby-council.test/transport-committee/2026-11-12#item-6',
      outlet: 'Marrowby Borough Council webcast',
      seenAt: '2026-11-12T19:42:00.000Z',
      seenTimeZone: 'Europe/London',
      isFirstKnown: true,
      captureAttachmentId: '7f4a9b32-8c5d-4d0e-8f3a-500000000001',
      addedBy: ref(reporter),
      createdAt: '2026-11-12T20:05:00.000Z',
      version: 2,
    },
  ],
  sources: [
    {
      id: '8a5b0c43-9d6e-4e1f-9a4b-600000000001',
      title: 'Heat flow from the Earth’s interior: analysis of the global data set',
      authors: 'Pollack, Hurter, Johnson',
      publisher: 'Reviews of Geophysics',
      year: 1993,
      doi: '10.1029/93RG01249',
      url: null,
      accessedOn: '2026-11-16',
      kind: 'peer_reviewed_paper',
      grade: 'strong',
      gradeReason:
        'The standard compilation of measured heat flow, peer reviewed and widely cited.',
      addedBy: ref(editor),
      createdAt: '2026-11-16T09:00:00.000Z',
      version: 1,
      linkedBy: ref(editor),
      linkedAt: '2026-11-16T09:00:00.000Z',
    },
  ],
  attachments: [
    {
      id: '7f4a9b32-8c5d-4d0e-8f3a-500000000001',
      originalName: 'council-webcast-item-6.png',
      mediaType: 'image/png',
      size: 18_842,
      sha256: '9f2c1a7e4b0d3c8e5f6a7b8c9d0e1f2a3b4c5d6e7f8091a2b3c4d5e6f7a8b9c0',
      uploadedBy: ref(reporter),
      uploadedAt: '2026-11-12T20:06:00.000Z',
    },
    {
      id: '7f4a9b32-8c5d-4d0e-8f3a-500000000002',
      originalName: 'ground-temperature-log.csv',
      mediaType: 'text/csv',
      size: 2_048,
      sha256: '0a1b2c3d4e5f60718293a4b5c6d7e8f90a1b2c3d4e5f60718293a4b5c6d7e8f9',
      uploadedBy: ref(editor),
      uploadedAt: '2026-11-17T10:00:00.000Z',
    },
  ],
  replyAttempts: [
    {
      id: '9b6c1d54-0e7f-4f2a-8b5c-700000000001',
      contacted: 'Councillor Threlkeld’s council office',
      contactedAt: '2026-11-16T10:05:00.000Z',
      channel: 'email',
      deadline: '2026-11-19T17:00:00.000Z',
      outcome: 'replied',
      reply: 'The councillor stands by his remarks.',
      loggedBy: ref(editor),
      createdAt: '2026-11-16T10:06:00.000Z',
      version: 1,
    },
  ],
  consultations: [
    {
      id: 'ac7d2e65-1f8a-4a3b-9c6d-800000000001',
      name: 'Dr Ilse Marchbank',
      affiliation: 'University of Wenlow (invented)',
      field: 'Geothermal heat flow',
      quote:
        'The heat flowing up from the interior averages under a tenth of a watt per square metre.',
      consultedOn: '2026-11-18',
      declaredConflicts: 'None declared',
      independentOfClaimant: true,
      loggedBy: ref(editor),
      createdAt: '2026-11-18T11:00:00.000Z',
      version: 1,
    },
  ],
  comments: [
    {
      id: 'bd8e3f76-2a9b-4b4c-8d7e-900000000001',
      body: 'The webcast timestamp is 1:42:10.',
      author: ref(reporter),
      createdAt: '2026-11-12T20:10:00.000Z',
      editedAt: null,
      version: 1,
    },
  ],
};

/** A claim a reporter filed that nobody has taken yet. */
export const filedClaim: ClaimDetail = {
  ...queueItems[1]!,
  text: 'The sun is getting brighter, and that is all there is to it.',
  claimant: weatherClub,
  setAsideReason: null,
  setAsideNote: null,
  version: 1,
  appearances: [],
  sources: [],
  attachments: [],
  replyAttempts: [],
  consultations: [],
  comments: [],
};
