import { z } from 'zod';
import { type ClaimantKind } from './claimants.js';
import { boundedText, instantSchema, timeZoneSchema, versionSchema } from './common.js';
import { type ReliabilityGrade, type SourceKind } from './sources.js';

/** Notes a published explainer takes when it changes; every one is shown, dated. */
export const updateNoteKinds = [
  'correction',
  'clarification',
  'update',
  'rating_change',
  'retraction',
] as const;
export type UpdateNoteKind = (typeof updateNoteKinds)[number];
export const updateNoteKindLabels: Record<UpdateNoteKind, string> = {
  correction: 'Correction',
  clarification: 'Clarification',
  update: 'Update',
  rating_change: 'Rating changed',
  retraction: 'Retraction',
};

/**
 * Publish the cleared version now (no `at`) or at an instant with its time zone (an
 * embargo). A claim published before needs an update note saying what changed.
 */
export const publishClaimSchema = z.object({
  at: instantSchema.optional(),
  timeZone: timeZoneSchema.optional(),
  note: z.object({ kind: z.enum(updateNoteKinds), text: boundedText(2000) }).optional(),
  version: versionSchema,
});
export type PublishClaimRequest = z.infer<typeof publishClaimSchema>;

/** A publication of one verdict version, as the desk sees it. */
export interface PublicationView {
  id: string;
  versionNumber: number;
  /** Its number among the claim's publications: 1 is the first. */
  sequence: number;
  state: 'scheduled' | 'published' | 'cancelled';
  scheduledFor: string | null;
  scheduledTimeZone: string | null;
  publishedAt: string | null;
  note: { kind: UpdateNoteKind; text: string } | null;
  /** This publication's own address. */
  url: string;
  /** The explainer's address for readers (always its latest publication); null before the first. */
  readerUrl: string | null;
}

// ——— What the reader pages are rendered from (built by the API from published records only) ———

export interface ReaderRating {
  id: string;
  number: number | null;
  label: string;
  description: string;
  isRating: boolean;
  /** The scale's ends, for ClaimReview: best is the highest number, worst the lowest. */
  bestRating: number;
  worstRating: number;
}

export interface ReaderSource {
  /** Its citation number: cited sources first, in order of first citation. */
  number: number;
  id: string;
  title: string;
  authors: string | null;
  publisher: string | null;
  year: number | null;
  doi: string | null;
  url: string | null;
  kind: SourceKind;
  kindLabel: string;
  grade: ReliabilityGrade;
  gradeLabel: string;
  gradeReason: string;
}

export interface ReaderWorkingInput {
  name: string;
  label: string;
  /** Formatted with its unit, e.g. "1361 W/m²", "0.28 – 0.32 (uniform)". */
  value: string;
  /** Where the default came from, when the input was left at its default. */
  source: string | null;
}

export interface ReaderWorkingOutput {
  name: string;
  label: string;
  kind: 'number' | 'list' | 'text' | 'table';
  /** number: a number; list: numbers; text: a string; table: rows of cells. */
  value: unknown;
  unit: string;
  band: { p5: number; p50: number; p95: number } | null;
  columns: Array<{ key: string; label: string; unit: string }> | null;
}

export interface ReaderWorking {
  id: string;
  calculatorId: string;
  title: string;
  libraryVersion: string;
  note: string | null;
  inputs: ReaderWorkingInput[];
  steps: Array<{ text: string; formula: string; result: string }>;
  outputs: ReaderWorkingOutput[];
  cautions: string[];
}

export interface ReaderAppearance {
  outlet: string;
  seenAt: string;
  seenTimeZone: string;
  isFirstKnown: boolean;
  /**
   * Where it was seen (shown as text, and linked only through the archived capture); null
   * when the claimant is a private individual readers may not name, whom it could name.
   */
  url: string | null;
  /**
   * The archived capture on our own site, linked with rel="nofollow"; null without one, and
   * withheld (null) as the address is.
   */
  captureUrl: string | null;
}

export interface ReaderUpdateNote {
  kind: UpdateNoteKind;
  kindLabel: string;
  text: string;
  at: string;
  /** The publication this note came with, readable at its own URL. */
  sequence: number;
  url: string;
}

export interface ReaderExplainer {
  slug: string;
  /** Canonical absolute URL of the latest publication. */
  url: string;
  /** Absolute URL of this publication (equal to `url` for the latest). */
  versionUrl: string;
  sequence: number;
  isLatest: boolean;
  claim: { text: string; summary: string; topics: string[] };
  claimant: {
    /** Null when the claimant is a private individual whose name is not shown. */
    name: string | null;
    /** What the page says: the name, or "A private individual". */
    displayName: string;
    kind: ClaimantKind;
    affiliation: string | null;
  };
  appearances: ReaderAppearance[];
  rating: ReaderRating | null;
  bottomLine: string;
  /** Sanitized HTML with `figure[data-working-id]` where workings go and numbered citations. */
  bodyHtml: string;
  workings: ReaderWorking[];
  sources: ReaderSource[];
  firstPublishedAt: string;
  publishedAt: string;
  /** Set once an update note has been published: the latest note's date. */
  modifiedAt: string | null;
  /** Newest first; on an earlier publication, the notes up to it. */
  updateNotes: ReaderUpdateNote[];
  retracted: boolean;
  publications: Array<{
    sequence: number;
    publishedAt: string;
    url: string;
    noteKind: UpdateNoteKind | null;
  }>;
}

export interface ReaderExplainerSummary {
  slug: string;
  url: string;
  summary: string;
  claimantDisplayName: string;
  rating: ReaderRating | null;
  bottomLine: string;
  topics: string[];
  firstPublishedAt: string;
  modifiedAt: string | null;
  retracted: boolean;
}

export interface ReaderCorrection {
  slug: string;
  url: string;
  summary: string;
  note: ReaderUpdateNote;
}

/** What every reader page knows about the site. */
export interface ReaderSite {
  name: string;
  /** Absolute origin, e.g. https://gazette.example. */
  origin: string;
  organisation: string;
  /** The newsroom's IANA time zone, for dates of publication and notes; UTC when absent. */
  timeZone?: string;
}

export const readerSubscriptionSchema = z.object({
  email: z.email({ error: 'Enter an e-mail address' }).max(254),
});
export type ReaderSubscriptionRequest = z.infer<typeof readerSubscriptionSchema>;
