import {
  claimStatusLabels,
  reliabilityGradeLabels,
  replyChannelLabels,
  replyOutcomeLabels,
  sourceKindLabels,
  claimantKindLabels,
  type ClaimHistoryEvent,
  type ClaimStatus,
} from '@skyledger/contracts';
import { formatBytes } from '@/lib/format-bytes';

const thingNames: Record<string, string> = {
  appearance: 'an appearance',
  reply_attempt: 'a reply attempt',
  consultation: 'an expert consultation',
  comment: 'a comment',
  attachment: 'a file',
  source: 'a source',
  claimant: 'the claimant',
  working: 'a working',
  verdict: 'the verdict',
};

const verbs: Record<string, string> = {
  added: 'added',
  updated: 'changed',
  removed: 'removed',
  uploaded: 'uploaded',
  linked: 'cited',
  unlinked: 'stopped citing',
  created: 'described',
  drafted: 'drafted a version of',
  edited: 'edited',
  rerun: 'reran',
};

/** Claim moves that are not a change of status, in words. */
const claimEvents: Record<string, string> = {
  scheduled: 'scheduled the explainer’s publication',
  schedule_cancelled: 'cancelled the scheduled publication',
  schedule_lapsed: 'saw the scheduled publication lapse (the claim was no longer cleared)',
  reply_waived: 'waived the right of reply',
};

function isStatus(value: string): value is ClaimStatus {
  return value in claimStatusLabels;
}

/** What an audit event says happened, after the actor's name: "cited a source". */
export function describeAction(event: ClaimHistoryEvent): string {
  const [entity = '', verb = ''] = event.action.split('.');
  if (entity === 'claim') {
    if (verb === 'filed') return 'filed the claim';
    if (verb === 'updated') return 'edited the claim';
    if (verb === 'unassigned') return 'took the claim off its researcher';
    if (verb === 'assigned') {
      const name = event.summary.assigneeName;
      return event.actor && event.summary.assignee && name === event.actor.displayName
        ? 'took the claim to research'
        : `gave the claim to ${typeof name === 'string' ? name : 'someone'}`;
    }
    if (verb === 'published') {
      return event.summary.note ? 'published the corrected explainer' : 'published the explainer';
    }
    if (claimEvents[verb]) return claimEvents[verb];
    if (isStatus(verb)) return `moved the claim to “${claimStatusLabels[verb]}”`;
  }
  const thing = thingNames[entity] ?? entity.replaceAll('_', ' ');
  return `${verbs[verb] ?? verb} ${thing}`;
}

function words(field: string): string {
  return field.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
}

/** The desk's words for the codes the audit trail stores, field by field. */
const codeLabels: Record<string, Record<string, string>> = {
  status: claimStatusLabels,
  grade: reliabilityGradeLabels,
  channel: replyChannelLabels,
  outcome: replyOutcomeLabels,
  kind: { ...sourceKindLabels, ...claimantKindLabels },
};

function showField(field: string, value: unknown): string {
  if (typeof value === 'string' && codeLabels[field]?.[value]) return codeLabels[field][value];
  if (field === 'size' && typeof value === 'number') return formatBytes(value);
  return show(value);
}

function show(value: unknown): string {
  if (value === null || value === undefined || value === '') return 'nothing';
  if (Array.isArray(value)) return value.length ? value.map(show).join(', ') : 'none';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

function isChange(value: unknown): value is { from: unknown; to: unknown } {
  return typeof value === 'object' && value !== null && 'from' in value && 'to' in value;
}

/** The event's details, one line each: "summary: old → new", or "outlet: Marrowby Courier". */
export function describeDetails(event: ClaimHistoryEvent): string[] {
  return Object.entries(event.summary)
    .filter(([field]) => field !== 'assigneeName' && field !== 'assignee')
    .map(([field, value]) =>
      isChange(value)
        ? `${words(field)}: ${showField(field, value.from)} → ${showField(field, value.to)}`
        : `${words(field)}: ${showField(field, value)}`,
    );
}
