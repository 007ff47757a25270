import {
  CLAIM_SUMMARY_MAX_LENGTH,
  CLAIM_TEXT_MAX_LENGTH,
  claimStatuses,
  createClaimantSchema,
  createSourceSchema,
  setAsideReasons,
  topicSchema,
  topicsSchema,
} from '@skyledger/contracts';
import { describe, expect, it } from 'vitest';
import { GENERATED_EMAIL_DOMAIN, GENERATED_NOTE } from './desk-rows';
import { deskDefaults, generatedDesk, type DeskOptions } from './generate-desk';

const options: DeskOptions = { ...deskDefaults, claims: 5000 };
const materialise = (desk: ReturnType<typeof generatedDesk>) => ({
  ...desk,
  claims: [...desk.claims],
});
const desk = materialise(generatedDesk(options));
const people = new Map(desk.people.map((person) => [person.id, person]));
const claims = desk.claims.map(({ claim }) => claim);

/** Drops nulls, as the desk's form would send an empty optional field. */
const present = (row: object) =>
  Object.fromEntries(Object.entries(row).filter(([, value]) => value !== null));

describe('the generated desk', () => {
  it('is the same for the same seed and different for another', () => {
    expect(materialise(generatedDesk(options))).toEqual(desk);
    const other = materialise(generatedDesk({ ...options, seed: 2 }));
    expect(other.claims[0]!.claim.id).not.toBe(desk.claims[0]!.claim.id);
    expect(other.claimants.map((claimant) => claimant.name)).not.toEqual(
      desk.claimants.map((claimant) => claimant.name),
    );
  });

  it('keeps the people, claimants and sources it made whatever the number of claims', () => {
    // Each kind draws from its own stream: asking for more claims only adds rows.
    const larger = generatedDesk({ ...options, claims: 10_000 });
    expect(larger.people).toEqual(desk.people);
    expect(larger.claimants.slice(0, desk.claimants.length)).toEqual(desk.claimants);
  });

  it('makes the counts asked for, with every status of the claim life', () => {
    expect(claims).toHaveLength(5000);
    expect(new Set(claims.map((claim) => claim.id)).size).toBe(5000);
    expect(new Set(claims.map((claim) => claim.status))).toEqual(new Set(claimStatuses));
    expect(desk.claimants).toHaveLength(250);
    expect(desk.sources).toHaveLength(200);
  });

  it('gives people who cannot sign in, labelled as generated', () => {
    expect(new Set(desk.people.map((person) => person.email)).size).toBe(desk.people.length);
    for (const person of desk.people) {
      expect(person.email.endsWith(`@${GENERATED_EMAIL_DOMAIN}`)).toBe(true);
      expect(person).toMatchObject({ status: 'active', passwordHash: null });
    }
  });

  it('follows the claim life: who is on a claim and why it was set aside', () => {
    for (const claim of claims) {
      const assignee = claim.assigneeId ? people.get(claim.assigneeId) : null;
      if (claim.status === 'filed') expect(assignee).toBeNull();
      else if (claim.status !== 'set_aside') expect(assignee).toBeTruthy();
      if (assignee) expect(['science_editor', 'desk_chief']).toContain(assignee.role);
      expect(['reporter', 'science_editor']).toContain(people.get(claim.filedById)?.role);

      if (claim.status === 'set_aside') expect(setAsideReasons).toContain(claim.setAsideReason);
      else expect(claim.setAsideReason).toBeNull();

      expect(claim.createdAt.getTime()).toBeLessThanOrEqual(options.until.getTime());
      expect(claim.updatedAt.getTime()).toBeGreaterThanOrEqual(claim.createdAt.getTime());
      expect(claim.updatedAt.getTime()).toBeLessThanOrEqual(options.until.getTime());
      expect(claim.version).toBeGreaterThanOrEqual(1);
    }
  });

  it('cites sources only on researched claims, by whoever researched them, each once', () => {
    const sourceIds = new Set(desk.sources.map((source) => source.id));
    let cited = 0;
    for (const { claim, sourceLinks } of desk.claims) {
      if (!claim.assigneeId) expect(sourceLinks).toEqual([]);
      expect(new Set(sourceLinks.map((link) => link.sourceId)).size).toBe(sourceLinks.length);
      for (const link of sourceLinks) {
        cited += 1;
        expect(sourceIds.has(link.sourceId)).toBe(true);
        expect(link).toMatchObject({ claimId: claim.id, linkedById: claim.assigneeId });
        expect(link.linkedAt.getTime()).toBeGreaterThanOrEqual(claim.createdAt.getTime());
        expect(link.linkedAt.getTime()).toBeLessThanOrEqual(claim.updatedAt.getTime());
      }
    }
    expect(cited).toBeGreaterThan(claims.length);
  });

  it('writes what the desk’s own forms would accept: summaries, texts and topics', () => {
    for (const { claim, topics } of desk.claims) {
      expect(claim.summary.length).toBeLessThanOrEqual(CLAIM_SUMMARY_MAX_LENGTH);
      expect(claim.text.length).toBeLessThanOrEqual(CLAIM_TEXT_MAX_LENGTH);
      const tags = topics.map((topic) => topic.topic);
      // Already in the form topicSchema normalises to, so the queue's filter finds them.
      expect(tags.map((tag) => topicSchema.parse(tag))).toEqual(tags);
      expect(topicsSchema.safeParse(tags).success).toBe(true);
      expect(topics.every((topic) => topic.claimId === claim.id)).toBe(true);
    }
  });

  it('makes claimants and sources the desk’s forms would accept, labelled as generated', () => {
    for (const claimant of desk.claimants) {
      expect(createClaimantSchema.safeParse(present(claimant)).error).toBeUndefined();
      expect(claimant.notes).toBe(GENERATED_NOTE);
    }
    for (const source of desk.sources) {
      expect(createSourceSchema.safeParse(present(source)).error).toBeUndefined();
      expect(source.gradeReason).toMatch(/Generated source; invented/);
      expect(source.doi ?? '10.5555/').toMatch(/^10\.5555\//);
    }
  });
});
