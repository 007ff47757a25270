import { libraryVersion, runCalculator } from '@skyledger/calc';
import {
  BOTTOM_LINE_MAX_LENGTH,
  publishClaimSchema,
  type ChecklistItem,
  type ClaimStatus,
  type VerdictVersionState,
} from '@skyledger/contracts';
import {
  citedSourceIds,
  cleanExplainerDocument,
  embeddedWorkingIds,
  type ExplainerDocument,
} from '@skyledger/explainer';
import { renderExplainerHtml } from '@skyledger/explainer/render';
import { describe, expect, it } from 'vitest';
import { claimRows } from './desk-rows';
import { deskDefaults, generatedDesk, type DeskOptions } from './generate-desk';
import { SeededRandom } from './random';
import { sourceRows, sourcesByTopic } from './source-rows';
import { defaultRatingIds } from './vocabulary';

const options: DeskOptions = { ...deskDefaults, claims: 5000 };
const desk = generatedDesk(options);
const claims = [...desk.claims];
const people = new Map(desk.people.map((person) => [person.id, person]));
const sources = new Map(desk.sources.map((source) => [source.id, source]));
const published = claims.filter(({ claim }) => claim.status === 'published');

/** The state of a claim's latest verdict version, by the claim's status. */
const latestState: Record<ClaimStatus, ReadonlyArray<VerdictVersionState | undefined>> = {
  filed: [undefined],
  in_research: [undefined, 'draft'],
  awaiting_signoff: ['submitted'],
  sent_back: ['sent_back'],
  cleared: ['cleared'],
  published: ['published'],
  set_aside: [undefined],
};

describe('the generated desk’s workings, verdicts and explainers', () => {
  it('publishes the explainers asked for: one claim in twenty by default, or as many as given', () => {
    expect(published).toHaveLength(250);
    const fewer = [...generatedDesk({ ...options, explainers: 40 }).claims];
    expect(fewer.filter(({ claim }) => claim.status === 'published')).toHaveLength(40);
    expect(fewer.flatMap((generated) => generated.publications).length).toBeGreaterThanOrEqual(40);
  });

  it('keeps every draw of the claims stream: the new rows come from streams of their own', () => {
    const library = sourceRows(SeededRandom.stream(options.seed, 'sources'), {
      ...options,
      count: desk.sources.length,
      people: desk.people,
    });
    const filed = [
      ...claimRows(SeededRandom.stream(options.seed, 'claims'), {
        ...options,
        count: options.claims,
        claimants: desk.claimants,
        people: desk.people,
        sourcesByTopic: sourcesByTopic(library),
      }),
    ];
    claims.forEach(({ claim, topics, sourceLinks }, index) => {
      const drawn = filed[index]!;
      const same = ['id', 'text', 'summary', 'claimantId', 'assigneeId', 'filedById'] as const;
      for (const field of same) expect(claim[field]).toBe(drawn.claim[field]);
      expect([claim.createdAt, claim.updatedAt]).toEqual([
        drawn.claim.createdAt,
        drawn.claim.updatedAt,
      ]);
      expect({ topics, sourceLinks }).toEqual({
        topics: drawn.topics,
        sourceLinks: drawn.sourceLinks,
      });
      // Published beyond the explainers asked for: set aside as a duplicate of one checked.
      if (claim.status !== drawn.claim.status) {
        expect([drawn.claim.status, claim.status, claim.setAsideReason].join(' → ')).toMatch(
          /^published → set_aside → duplicate$|^cleared → awaiting_signoff → $/,
        );
      }
    });
  });

  it('gives each claim the verdict versions its status implies, drafted by its researcher', () => {
    for (const { claim, verdictVersions } of claims) {
      const latest = verdictVersions[verdictVersions.length - 1];
      expect(latestState[claim.status]).toContain(latest?.state);
      verdictVersions.forEach((version, index) => {
        expect(version).toMatchObject({
          claimId: claim.id,
          number: index + 1,
          createdById: claim.assigneeId,
          lastEditedById: claim.assigneeId,
        });
        expect(version.submittedAt === null).toBe(version.state === 'draft');
        expect(defaultRatingIds).toContain(version.ratingId);
        expect(version.bottomLine.length).toBeLessThanOrEqual(BOTTOM_LINE_MAX_LENGTH);
        expect(version.createdAt.getTime()).toBeGreaterThanOrEqual(claim.createdAt.getTime());
        expect(version.updatedAt.getTime()).toBeLessThanOrEqual(claim.updatedAt.getTime());
      });
      // Only the latest version is ever open; earlier ones were decided.
      for (const earlier of verdictVersions.slice(0, -1)) {
        expect(['sent_back', 'superseded']).toContain(earlier.state);
      }
    }
  });

  it('clears only what sign-off would clear, and never by the version’s drafter', () => {
    let cleared = 0;
    for (const { claim, verdictVersions, signoffDecisions, sourceLinks } of claims) {
      for (const version of verdictVersions) {
        const decisions = signoffDecisions.filter((decision) => decision.versionId === version.id);
        expect(decisions).toHaveLength(['draft', 'submitted'].includes(version.state) ? 0 : 1);
        for (const decision of decisions) {
          const decider = people.get(decision.decidedById)!;
          expect(decider.role).toBe('copy_desk');
          expect(decider.id).not.toBe(version.createdById);
          expect(decision.at.getTime()).toBeGreaterThanOrEqual(version.submittedAt!.getTime());
          expect(decision.decision).toBe(version.state === 'sent_back' ? 'sent_back' : 'cleared');
          expect(decision.notes === null).toBe(decision.decision === 'cleared');
          const checklist = JSON.parse(decision.checklist) as ChecklistItem[];
          if (decision.decision === 'cleared') {
            cleared += 1;
            expect(checklist.filter((item) => !item.done)).toEqual([]);
          }
        }
        // What readers are shown with the version: the claim as it was cleared.
        const asCleared = {
          text: claim.text,
          summary: claim.summary,
          id: claim.claimantId,
          parts: { appearanceIds: [], sourceIds: sourceLinks.map((link) => link.sourceId) },
        };
        const none = { text: null, summary: null, id: null, parts: null };
        expect({
          text: version.claimText,
          summary: version.claimSummary,
          id: version.claimantId,
          parts: version.clearedParts && JSON.parse(version.clearedParts),
        }).toEqual(decisions.some((d) => d.decision === 'cleared') ? asCleared : none);
      }
      if (claim.status !== 'cleared' && claim.status !== 'published') continue;
      expect(claim.legalReview).toBe(false);
      expect(people.get(claim.replyWaivedById!)?.role).toBe('desk_chief');
      expect(claim.replyWaiverReason).toBeTruthy();
      const firstDecision = Math.min(...signoffDecisions.map((decision) => decision.at.getTime()));
      expect(claim.replyWaivedAt!.getTime()).toBeLessThanOrEqual(firstDecision);
      const primary = verdictVersions[verdictVersions.length - 1]!.primarySourceId!;
      expect(sourceLinks.map((link) => link.sourceId)).toContain(primary);
      expect(['strong', 'adequate']).toContain(sources.get(primary)!.grade);
    }
    expect(cleared).toBeGreaterThan(published.length);
  });

  it('publishes each explainer at a unique address, its later publications with a note', () => {
    const slugs = new Set<string>();
    for (const { claim, publications, verdictVersions } of claims) {
      if (claim.status !== 'published') {
        expect([claim.slug, claim.firstPublishedAt, publications]).toEqual([null, null, []]);
        continue;
      }
      expect(claim.slug).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(claim.slug!.length).toBeLessThanOrEqual(100);
      slugs.add(claim.slug!);
      expect(claim.firstPublishedAt).toEqual(publications[0]!.publishedAt);
      expect(publications[publications.length - 1]!.publishedAt).toEqual(claim.updatedAt);
      publications.forEach((publication, index) => {
        const version = verdictVersions.find((v) => v.id === publication.versionId)!;
        const isLast = index === publications.length - 1;
        expect(version.state).toBe(isLast ? 'published' : 'superseded');
        expect(publication).toMatchObject({ claimId: claim.id, sequence: index + 1 });
        expect(publication.publishedAt.getTime()).toBeLessThanOrEqual(options.until.getTime());
        if (index === 0) expect([publication.noteKind, publication.noteText]).toEqual([null, null]);
        else {
          const note = { kind: publication.noteKind, text: publication.noteText };
          expect(publishClaimSchema.safeParse({ note, version: 1 }).error).toBeUndefined();
        }
        if (index > 0) {
          const before = publications[index - 1]!.publishedAt.getTime();
          expect(publication.publishedAt.getTime()).toBeGreaterThan(before);
        }
      });
    }
    expect(slugs.size).toBe(published.length);
    expect(claims.some(({ publications }) => publications.length > 1)).toBe(true);
  });

  it('saves workings whose outputs the calculator gives again, by the claim’s researcher', () => {
    const checked = new Set<string>();
    for (const { claim, workings, verdictVersions } of claims) {
      if (!claim.assigneeId || ['filed', 'set_aside'].includes(claim.status)) {
        expect(workings).toEqual([]);
      }
      for (const working of workings) {
        expect(working).toMatchObject({ claimId: claim.id, createdById: claim.assigneeId });
        expect(working.libraryVersion).toBe(libraryVersion);
        expect(working.createdAt.getTime()).toBeGreaterThanOrEqual(claim.createdAt.getTime());
        for (const version of verdictVersions) {
          expect(working.createdAt.getTime()).toBeLessThanOrEqual(version.createdAt.getTime());
        }
        const key = `${working.calculatorId} ${working.inputs}`;
        if (checked.has(key)) continue;
        checked.add(key);
        // As the server recomputes a working for sign-off: from its stored inputs alone.
        const rerun = runCalculator(working.calculatorId, JSON.parse(working.inputs));
        expect(JSON.parse(working.outputs)).toEqual(JSON.parse(JSON.stringify(rerun.outputs)));
        expect(JSON.parse(working.steps)).toEqual(JSON.parse(JSON.stringify(rerun.steps)));
      }
    }
    expect(checked.size).toBeGreaterThanOrEqual(6);
    const bands = claims.flatMap(({ workings }) => workings).filter((w) => w.monteCarlo);
    expect(bands.length).toBeGreaterThan(0);
  });

  it('stores explainers as the API would: clean documents and their sanitized HTML', () => {
    const shapes = new Map<string, (typeof claims)[number]>();
    for (const generated of claims) {
      for (const version of generated.verdictVersions) {
        const doc = JSON.parse(version.body) as ExplainerDocument;
        const shape = `${version.bottomLine} ${citedSourceIds(doc).length} ${embeddedWorkingIds(doc).length}`;
        if (!shapes.has(shape)) shapes.set(shape, generated);
        // Cites only the claim's sources and embeds only its workings, as the API checks.
        const own = new Set(generated.sourceLinks.map((link) => link.sourceId));
        expect(citedSourceIds(doc).every((id) => own.has(id))).toBe(true);
        const workings = new Set(generated.workings.map((working) => working.id));
        expect(embeddedWorkingIds(doc).every((id) => workings.has(id))).toBe(true);
      }
    }
    expect(shapes.size).toBeGreaterThan(30);
    // Every shape rendered once by the generator, checked against a render of this row.
    for (const { verdictVersions } of shapes.values()) {
      const version = verdictVersions[0]!;
      const doc = JSON.parse(version.body) as unknown;
      expect(cleanExplainerDocument(doc)).toEqual(doc);
      expect(version.bodyHtml).toBe(renderExplainerHtml(doc));
    }
  });
});
