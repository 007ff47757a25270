import {
  type ClaimantKind,
  type ClaimStatus,
  type Role,
  type SetAsideReason,
} from '@skyledger/contracts';
import { type SeededRandom } from './random';
import { type SourceRow } from './source-rows';
import {
  type ClaimPattern,
  claimPatterns,
  extraTopics,
  familyNames,
  givenNames,
  organisationForms,
  places,
  publicTitles,
} from './vocabulary';

/*
 * Rows as the generator writes them, keyed by the API entities' property names (the
 * writer maps them to columns through TypeORM's metadata, so a renamed column fails loudly).
 */

export interface PersonRow {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  status: 'active';
  /** No password: a generated person cannot sign in. */
  passwordHash: null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export interface ClaimantRow {
  id: string;
  name: string;
  kind: ClaimantKind;
  affiliation: string | null;
  notes: string;
  nameShownPublicly: boolean;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export interface ClaimRow {
  id: string;
  text: string;
  summary: string;
  status: ClaimStatus;
  legalReview: boolean;
  claimantId: string;
  assigneeId: string | null;
  filedById: string;
  setAsideReason: SetAsideReason | null;
  /** Set on first publication (verdict-rows.ts). */
  slug: string | null;
  firstPublishedAt: Date | null;
  /** A desk chief's waiver of the right of reply, before a claim is cleared. */
  replyWaiverReason: string | null;
  replyWaivedById: string | null;
  replyWaivedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export interface TopicRow {
  claimId: string;
  topic: string;
}

export interface ClaimSourceRow {
  claimId: string;
  sourceId: string;
  linkedById: string;
  linkedAt: Date;
}

/** A claim as filed and researched, before its verdict: the rows of the `claims` stream. */
export interface FiledClaim {
  claim: ClaimRow;
  topics: TopicRow[];
  sourceLinks: ClaimSourceRow[];
  /** The kind of claim it is, which its working and verdict follow. */
  pattern: ClaimPattern;
}

/** The time span generated rows fall in. */
export interface DeskSpan {
  /** Filing dates run from `until - years` to `until`, busier towards the end. */
  until: Date;
  years: number;
}

/** Generated people and claimants say so, wherever the desk shows them. */
export const GENERATED_EMAIL_DOMAIN = 'generated.marrowby-gazette.test';
export const GENERATED_NOTE = 'Generated for scale tests by the seeds-demo generator; invented.';

const DAY_MS = 86_400_000;

export function spanStart(span: DeskSpan): Date {
  return new Date(span.until.getTime() - span.years * 365 * DAY_MS);
}

/** The statuses a claim of this age is likely to have reached: new ones open, old ones done. */
function statusWeights(ageDays: number): Record<ClaimStatus, number> {
  if (ageDays < 14) {
    return {
      filed: 45,
      in_research: 40,
      awaiting_signoff: 8,
      sent_back: 3,
      cleared: 0,
      published: 0,
      set_aside: 4,
    };
  }
  if (ageDays < 90) {
    return {
      filed: 8,
      in_research: 30,
      awaiting_signoff: 10,
      sent_back: 5,
      cleared: 7,
      published: 25,
      set_aside: 15,
    };
  }
  return {
    filed: 1,
    in_research: 2,
    awaiting_signoff: 0.5,
    sent_back: 0.5,
    cleared: 1,
    published: 70,
    set_aside: 25,
  };
}

/** The invented desk that files and researches generated claims: fixed e-mails, seeded ids. */
export function generatedPeople(random: SeededRandom, span: DeskSpan): PersonRow[] {
  const roster: Array<[Role, number]> = [
    ['reporter', 8],
    ['science_editor', 6],
    ['copy_desk', 2],
    ['desk_chief', 2],
  ];
  const joined = spanStart(span);
  const people: PersonRow[] = [];
  for (const [role, count] of roster) {
    for (let n = 1; n <= count; n += 1) {
      people.push({
        id: random.uuid(),
        email: `${role.replace('_', '-')}-${String(n).padStart(2, '0')}@${GENERATED_EMAIL_DOMAIN}`,
        displayName: `${random.pick(givenNames)} ${random.pick(familyNames)}`,
        role,
        status: 'active',
        passwordHash: null,
        createdAt: joined,
        updatedAt: joined,
        version: 1,
      });
    }
  }
  return people;
}

export function claimantRows(random: SeededRandom, count: number, span: DeskSpan): ClaimantRow[] {
  const known = spanStart(span);
  return Array.from({ length: count }, (_, index) => {
    const kind = random.weighted<ClaimantKind>({
      public_figure: 45,
      organisation: 35,
      private_individual: 20,
    });
    const person = `${random.pick(givenNames)} ${random.pick(familyNames)}`;
    const name =
      kind === 'organisation'
        ? random.pick(organisationForms).replace('{place}', random.pick(places))
        : kind === 'public_figure'
          ? `${random.pick(publicTitles)} ${person}`.trim()
          : person;
    return {
      id: random.uuid(),
      // The number keeps generated names apart in search; they stay invented.
      name: `${name} ${index + 1}`,
      kind,
      affiliation: kind === 'public_figure' ? `${random.pick(places)} Borough Council` : null,
      notes: GENERATED_NOTE,
      // As ClaimantsService files them: only a desk chief may show a private name.
      nameShownPublicly: false,
      createdAt: known,
      updatedAt: known,
      version: 1,
    };
  });
}

/**
 * The claims, one at a time (100 000 need not sit in memory), each following the claim
 * life: a `filed` claim has nobody on it, every claim past `filed` was researched by a
 * science editor or desk chief (a set-aside one maybe), a `set_aside` claim has its
 * reason, and sources are cited only on researched claims, by whoever researched them.
 */
export function* claimRows(
  random: SeededRandom,
  options: DeskSpan & {
    count: number;
    claimants: readonly ClaimantRow[];
    people: readonly PersonRow[];
    /** Sources by topic; a researched claim cites a few on its own topics. */
    sourcesByTopic: ReadonlyMap<string, readonly SourceRow[]>;
  },
): Generator<FiledClaim> {
  const reporters = options.people.filter((person) => person.role === 'reporter');
  const editors = options.people.filter((person) => person.role === 'science_editor');
  const chiefs = options.people.filter((person) => person.role === 'desk_chief');
  if (reporters.length === 0 || editors.length === 0 || chiefs.length === 0) {
    throw new Error('claimRows needs at least one reporter, science editor and desk chief');
  }
  if (options.claimants.length === 0) throw new Error('claimRows needs at least one claimant');
  const patternWeights = Object.fromEntries(
    claimPatterns.map((pattern, index) => [String(index), pattern.weight]),
  );
  const span = options.years * 365 * DAY_MS;
  const end = options.until.getTime();
  for (let n = 0; n < options.count; n += 1) {
    // sqrt(u) has density 2u: the desk files more claims every year.
    const createdAt = new Date(Math.floor(end - span + span * Math.sqrt(random.next())));
    const ageDays = (end - createdAt.getTime()) / DAY_MS;
    const status = random.weighted(statusWeights(ageDays));
    const claimant = options.claimants[random.skewedIndex(options.claimants.length)]!;
    const pattern = claimPatterns[Number(random.weighted(patternWeights))]!;
    const phrasing = random.pick(pattern.phrasings);
    const year = createdAt.getUTCFullYear() - 1 - random.below(12);
    const place = random.pick(places);
    const fillIn = (template: string) =>
      template.replaceAll('{place}', place).replaceAll('{year}', String(year));

    const researched = status !== 'filed' && (status !== 'set_aside' || random.chance(0.5));
    const assignee = researched
      ? random.chance(0.1)
        ? random.pick(chiefs)
        : editors[random.skewedIndex(editors.length, 1.6)]!
      : null;
    const filedBy = random.chance(0.8) ? random.pick(reporters) : random.pick(editors);
    const legalReview = random.chance(claimant.kind === 'private_individual' ? 0.25 : 0.02);
    const busyDays = status === 'filed' ? 2 : 60;
    const busyMs = Math.floor(random.next() * Math.min(ageDays, busyDays) * DAY_MS);
    const updatedAt = new Date(createdAt.getTime() + busyMs);
    const topics = new Set(pattern.topics);
    if (random.chance(0.3)) topics.add(random.pick(extraTopics));
    const id = random.uuid();

    const sourceLinks = assignee
      ? random
          .pickDistinct(
            options.sourcesByTopic.get(random.pick(pattern.topics)) ?? [],
            1 + random.below(4),
            2,
          )
          .map((source) => ({
            claimId: id,
            sourceId: source.id,
            linkedById: assignee.id,
            linkedAt: new Date(createdAt.getTime() + Math.floor(random.next() * busyMs)),
          }))
      : [];
    yield {
      claim: {
        id,
        text: fillIn(phrasing.text),
        summary: fillIn(phrasing.summary),
        status,
        legalReview,
        claimantId: claimant.id,
        assigneeId: assignee?.id ?? null,
        filedById: filedBy.id,
        setAsideReason:
          status === 'set_aside'
            ? random.weighted<SetAsideReason>({
                duplicate: 50,
                not_checkable: 30,
                out_of_scope: 20,
              })
            : null,
        slug: null,
        firstPublishedAt: null,
        replyWaiverReason: null,
        replyWaivedById: null,
        replyWaivedAt: null,
        createdAt,
        updatedAt,
        version: 1 + random.below(status === 'filed' ? 2 : 8),
      },
      topics: [...topics].map((topic) => ({ claimId: id, topic })),
      sourceLinks,
      pattern,
    };
  }
}
