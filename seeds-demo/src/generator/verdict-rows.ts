import {
  checklistItem,
  legalReviewItem,
  reliabilityGradeLabels,
  type ChecklistItem,
  type ClaimStatus,
  type SignoffDecision,
  type UpdateNoteKind,
  type VerdictVersionState,
} from '@skyledger/contracts';
import slugify from 'slugify';
import { type ClaimRow, type FiledClaim, type PersonRow } from './desk-rows';
import { explainerBody } from './explainer-bodies';
import { type SeededRandom } from './random';
import { type SourceRow } from './source-rows';
import { updateNotes, type RatingLevelId } from './vocabulary';
import { duringClaim, workingRows, type WorkingRow } from './working-rows';

export interface VerdictVersionRow {
  id: string;
  claimId: string;
  number: number;
  state: VerdictVersionState;
  ratingId: RatingLevelId;
  bottomLine: string;
  /** The Tiptap document as JSON text. */
  body: string;
  bodyHtml: string;
  primarySourceId: string | null;
  createdById: string;
  lastEditedById: string;
  submittedAt: Date | null;
  /** The claim as the copy desk cleared it (cleared versions and later); else null. */
  claimText: string | null;
  claimSummary: string | null;
  claimantId: string | null;
  /** Its appearances and sources then, as JSON text (generated claims have no appearances). */
  clearedParts: string | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export interface SignoffDecisionRow {
  id: string;
  claimId: string;
  versionId: string;
  decision: SignoffDecision;
  notes: string | null;
  decidedById: string;
  /** The checklist as it stood, as JSON text. */
  checklist: string;
  at: Date;
}

export interface PublicationRow {
  id: string;
  claimId: string;
  versionId: string;
  sequence: number;
  state: 'published';
  scheduledFor: null;
  scheduledTimeZone: null;
  publishedAt: Date;
  noteKind: UpdateNoteKind | null;
  noteText: string | null;
  createdById: string;
  createdAt: Date;
}

/** One generated claim and every row that hangs off it, in the order they are written. */
export interface GeneratedClaim extends FiledClaim {
  workings: WorkingRow[];
  verdictVersions: VerdictVersionRow[];
  signoffDecisions: SignoffDecisionRow[];
  publications: PublicationRow[];
}

/** A random stream per kind of row these claims add. */
export interface VerdictStreams {
  workings: SeededRandom;
  verdicts: SeededRandom;
  signoffs: SeededRandom;
  publications: SeededRandom;
}

/** The grades a primary source needs before the copy desk may clear a verdict. */
const primaryGrades = new Set<SourceRow['grade']>(['strong', 'adequate']);
const REPLY_WAIVER =
  'Generated claim: the invented claimant has no contact details, so no reply can be sought.';
const SENT_BACK_NOTES = 'Cite the primary source beside the central figure, then resubmit.';

/** The verdict versions a claim of this status has, oldest first, by the state each is in. */
function versionStates(random: SeededRandom, status: ClaimStatus): VerdictVersionState[] {
  switch (status) {
    case 'in_research':
      return random.chance(0.5) ? ['draft'] : [];
    case 'awaiting_signoff':
      return random.chance(0.2) ? ['sent_back', 'submitted'] : ['submitted'];
    case 'sent_back':
      return ['sent_back'];
    case 'cleared':
      return ['cleared'];
    case 'published':
      // A few explainers have been corrected since: the first version is superseded.
      return random.chance(0.05) ? ['superseded', 'published'] : ['published'];
    default:
      return [];
  }
}

const decided = new Set<VerdictVersionState>(['sent_back', 'cleared', 'published', 'superseded']);
const publishedStates = new Set<VerdictVersionState>(['published', 'superseded']);
const clearedStates = new Set<VerdictVersionState>(['cleared', ...publishedStates]);

/** The sign-off checklist as the API words it, for a claim in the state these rows make. */
function checklist(
  claim: ClaimRow,
  primary: SourceRow | null,
  workings: number,
  waivedBy: PersonRow | null,
): ChecklistItem[] {
  return [
    checklistItem('verdictComplete', true, 'All three are there'),
    checklistItem(
      'primarySource',
      primary !== null,
      primary
        ? `${primary.title} (${reliabilityGradeLabels[primary.grade].toLowerCase()})`
        : 'Choose the source that backs the central finding',
    ),
    checklistItem(
      'rightOfReply',
      waivedBy !== null,
      waivedBy
        ? `Waived by ${waivedBy.displayName}: ${REPLY_WAIVER}`
        : 'Log an attempt to reach the claimant, or ask a desk chief to waive it with a reason',
    ),
    checklistItem(
      'workingsRecomputed',
      true,
      workings ? `All ${workings} recomputed now and unchanged` : 'No workings on this claim',
    ),
    legalReviewItem(claim.legalReview),
  ];
}

/** The readable part of an explainer's address; the claim's id keeps it unique. */
export function generatedSlug(claim: Pick<ClaimRow, 'id' | 'summary'>): string {
  const base = slugify(claim.summary, { lower: true, strict: true, locale: 'en' })
    .slice(0, 80)
    .replace(/-+$/, '');
  return `${base || 'explainer'}-${claim.id.slice(0, 8)}`;
}

/**
 * Takes each claim as far along the claim life as its status says, with the rows that
 * takes: workings, verdict versions, the copy desk's decisions and publications. The
 * rules of sign-off hold for every claim: a cleared or published one has a primary
 * source graded strong or adequate, its right of reply waived by a desk chief, its
 * legal flag cleared and its verdict cleared by the copy desk, never by its drafter.
 *
 * The desk files far more claims than it publishes: only the first `explainers` claims
 * drawn as published get an explainer; the others are set aside as duplicates of one
 * already checked (which, made from a few patterns, they are). A claim drawn as cleared
 * without a source fit to be primary still waits for sign-off.
 */
export function* withVerdicts(
  claims: Iterable<FiledClaim>,
  options: {
    streams: VerdictStreams;
    explainers: number;
    people: readonly PersonRow[];
    sources: ReadonlyMap<string, SourceRow>;
  },
): Generator<GeneratedClaim> {
  const { workings: workingRandom, verdicts, signoffs, publications } = options.streams;
  const copyDesk = options.people.filter((person) => person.role === 'copy_desk');
  const chiefs = options.people.filter((person) => person.role === 'desk_chief');
  if (copyDesk.length === 0 || chiefs.length === 0) {
    throw new Error('withVerdicts needs at least one copy desk member and one desk chief');
  }
  let published = 0;
  for (const filed of claims) {
    const claim: ClaimRow = { ...filed.claim };
    const linked = filed.sourceLinks.map((link) => options.sources.get(link.sourceId)!);
    const primary = linked.find((source) => primaryGrades.has(source.grade)) ?? null;
    if (claim.status === 'published') {
      if (published < options.explainers && primary) published += 1;
      else {
        claim.status = 'set_aside';
        claim.setAsideReason = 'duplicate';
      }
    }
    if (claim.status === 'cleared' && !primary) claim.status = 'awaiting_signoff';
    const signedOff = claim.status === 'cleared' || claim.status === 'published';
    const researcherId = claim.assigneeId;
    if (!researcherId || claim.status === 'set_aside' || claim.status === 'filed') {
      yield {
        ...filed,
        claim,
        workings: [],
        verdictVersions: [],
        signoffDecisions: [],
        publications: [],
      };
      continue;
    }

    const calculations =
      claim.status === 'in_research' && !workingRandom.chance(0.6)
        ? []
        : filed.pattern.calculations;
    const workings = workingRows(workingRandom, claim, calculations, researcherId);

    let waivedBy: PersonRow | null = null;
    if (signedOff) {
      waivedBy = verdicts.pick(chiefs);
      claim.legalReview = false;
      claim.replyWaiverReason = REPLY_WAIVER;
      claim.replyWaivedById = waivedBy.id;
      claim.replyWaivedAt = duringClaim(claim, 0.38);
    }
    const states = versionStates(verdicts, claim.status);
    // The pattern's ratings leave out the levels it never gets: a weight of none.
    const ratingId = verdicts.weighted(
      filed.pattern.verdict.ratings as Readonly<Record<RatingLevelId, number>>,
    );
    const cited = [primary, ...linked.filter((source) => source !== primary)].filter(
      (source): source is SourceRow => source !== null,
    );
    const { body, bodyHtml } = explainerBody(filed.pattern.verdict, {
      claimText: claim.text,
      sourceIds: cited.map((source) => source.id),
      workingId: workings[0]?.id ?? null,
    });
    const versions: VerdictVersionRow[] = [];
    const decisions: SignoffDecisionRow[] = [];
    const publicationRows: PublicationRow[] = [];
    // Each version has an equal slot of the research after 40 % of it: drafted, submitted,
    // decided, and published at the slot's end (the last one when the claim last changed).
    const slot = 0.6 / Math.max(1, states.length);
    states.forEach((state, index) => {
      const at = (step: number) => duringClaim(claim, 0.4 + slot * (index + step));
      const version: VerdictVersionRow = {
        id: verdicts.uuid(),
        claimId: claim.id,
        number: index + 1,
        state,
        ratingId,
        bottomLine: filed.pattern.verdict.bottomLine,
        body,
        bodyHtml,
        primarySourceId: cited[0]?.id ?? null,
        createdById: researcherId,
        lastEditedById: researcherId,
        submittedAt: state === 'draft' ? null : at(0.5),
        ...(clearedStates.has(state)
          ? {
              claimText: claim.text,
              claimSummary: claim.summary,
              claimantId: claim.claimantId,
              clearedParts: JSON.stringify({
                appearanceIds: [],
                sourceIds: filed.sourceLinks.map((link) => link.sourceId),
              }),
            }
          : { claimText: null, claimSummary: null, claimantId: null, clearedParts: null }),
        createdAt: at(0),
        updatedAt: at(0.3),
        version: 1 + verdicts.below(6),
      };
      versions.push(version);
      if (!decided.has(state)) return;
      const decider = signoffs.pick(copyDesk);
      const decision: SignoffDecision = state === 'sent_back' ? 'sent_back' : 'cleared';
      decisions.push({
        id: signoffs.uuid(),
        claimId: claim.id,
        versionId: version.id,
        decision,
        notes: decision === 'sent_back' ? SENT_BACK_NOTES : null,
        decidedById: decider.id,
        checklist: JSON.stringify(
          checklist(claim, primary, workings.length, decision === 'cleared' ? waivedBy : null),
        ),
        at: at(0.7),
      });
      if (!publishedStates.has(state)) return;
      const sequence = publicationRows.length + 1;
      const noteKind =
        sequence > 1
          ? publications.weighted<keyof typeof updateNotes>({
              correction: 3,
              clarification: 2,
              update: 3,
            })
          : null;
      const publishedAt = at(1);
      publicationRows.push({
        id: publications.uuid(),
        claimId: claim.id,
        versionId: version.id,
        sequence,
        state: 'published',
        scheduledFor: null,
        scheduledTimeZone: null,
        publishedAt,
        noteKind,
        noteText: noteKind ? updateNotes[noteKind] : null,
        createdById: decider.id,
        createdAt: publishedAt,
      });
    });
    if (publicationRows.length) {
      claim.slug = generatedSlug(claim);
      claim.firstPublishedAt = publicationRows[0]!.publishedAt;
    }
    yield {
      ...filed,
      claim,
      workings,
      verdictVersions: versions,
      signoffDecisions: decisions,
      publications: publicationRows,
    };
  }
}
