import type {
  AttachmentView,
  ClaimDetail,
  DatasetDetail,
  DatasetUploadView,
  PublicationView,
  RatingLevelView,
  UsersListResponse,
  VerdictVersionView,
} from '@skyledger/contracts';
import { expect } from 'vitest';
import { demo, deskApi, deskToken } from './desk';
import {
  corpus,
  fitting,
  hostileWebUrls,
  joined,
  scriptUrls,
  type Payload,
} from './hostile-corpus';

type DeskApi = Awaited<ReturnType<typeof deskApi>>;

/** A text as the desk stores and shows it, and the field it was put in. */
export interface Placed {
  field: string;
  text: string;
}

/** What the corpus was put into, for the pages that show it. */
export interface PlantedDesk {
  /** One claim per payload: its text, summary and claimant are that payload. */
  perPayload: Array<{ payload: Payload; id: string }>;
  /** Researched, sent back once, published, corrected: every part of it is hostile. */
  published: { id: string; slug: string; captureId: string };
  /** Awaiting sign-off of its second version, the first sent back with hostile notes. */
  awaitingSignoff: string;
  /** In research with a hostile draft open in the editor. */
  drafting: string;
  /** Set aside with a hostile note. */
  setAside: string;
  datasetIds: string[];
  /** The names the evidence files were stored under. */
  fileNames: string[];
  /** The reporter's new display name. */
  reporterName: string;
  reporterId: string;
  /** Every text put in, by field. */
  placed: Placed[];
}

const seenAt = '2026-11-20T18:30:00+00:00';
const london = 'Europe/London';
const evidenceNotes = 'Called the harbour office at 10:05; they will call back.\n';
const datasetCsv = 'year,anomaly\n2019,0.98\n2020,1.01\n2021,0.85\n';
/** The smallest valid PNG: 1×1, RGBA (ISO/IEC 15948). */
const onePixelPng = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);

/** The explainer's Tiptap document with the corpus in it, and every trick a document can hold. */
export function hostileDocument(sourceId: string, workingId?: string) {
  const text = (value: string, marks?: unknown[]) => ({
    type: 'text',
    text: value,
    ...(marks ? { marks } : {}),
  });
  return {
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 2 }, content: [text(corpus[0]!.text)] },
      // Attributes the schema does not know, on nodes it does: dropped by the server.
      {
        type: 'heading',
        attrs: { level: `2" onclick="alert('SKYLEDGER-XSS-attr1')` },
        content: [text(corpus[1]!.text)],
      },
      ...corpus.map((payload) => ({
        type: 'paragraph',
        attrs: { style: 'background:url(javascript:alert(1))', onclick: 'alert(1)' },
        content: [text(payload.text)],
      })),
      {
        type: 'paragraph',
        content: [
          ...scriptUrls.map((href, index) =>
            text(`script link ${index + 1} `, [{ type: 'link', attrs: { href } }]),
          ),
          text('a web link', [
            { type: 'bold' },
            { type: 'link', attrs: { href: hostileWebUrls[0]!.text, onclick: 'alert(1)' } },
          ]),
          { type: 'sourceCitation', attrs: { sourceId: `"><script>alert(1)</script>` } },
          { type: 'sourceCitation', attrs: { sourceId } },
        ],
      },
      // Nodes the schema does not know: dropped.
      { type: 'html', content: [text(`<script>alert('SKYLEDGER-XSS-node1')</script>`)] },
      { type: 'iframe', attrs: { src: `javascript:alert('SKYLEDGER-XSS-node2')` } },
      {
        type: 'orderedList',
        attrs: { start: `1"><script>alert('SKYLEDGER-XSS-attr2')</script>` },
        content: [
          { type: 'listItem', content: [{ type: 'paragraph', content: [text(corpus[2]!.text)] }] },
        ],
      },
      ...(workingId ? [{ type: 'workingEmbed', attrs: { workingId } }] : []),
    ],
  };
}

/** An upload through the desk's multipart route, as the browser's form would send it. */
async function upload<T>(
  baseUrl: string,
  token: string,
  path: string,
  bytes: Buffer,
  name: string,
): Promise<T> {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(bytes)]), name);
  const response = await fetch(`${baseUrl}/api${path}`, {
    method: 'POST',
    headers: { Authorization: `Bearer ${token}` },
    body: form,
  });
  if (!response.ok)
    throw new Error(`upload of ${name}: ${response.status} ${await response.text()}`);
  return (await response.json()) as T;
}

/** A request the API must refuse with 400 naming `field`. */
async function expectRefused(request: Promise<unknown>, field: string): Promise<void> {
  await expect(request).rejects.toThrow(new RegExp(`: 400 .*"(?:[\\w.]+\\.)?${field}":`));
}

/**
 * Puts the corpus through every free-text field of the desk, through its API as the four
 * demo people would: claims, claimants, appearances, sources, files, workings, replies,
 * experts, comments, verdicts and explainers, sign-off notes, a reply waiver, update
 * notes, a set-aside note, datasets, rating levels and people's names. Takes one claim to
 * published and corrected, one to awaiting sign-off and one to an open draft.
 */
export async function plantCorpus(baseUrl: string): Promise<PlantedDesk> {
  const [reporter, editor, copy, chief] = await Promise.all([
    deskApi(baseUrl, demo.reporter.email),
    deskApi(baseUrl, demo.science_editor.email),
    deskApi(baseUrl, demo.copy_desk.email),
    deskApi(baseUrl, demo.desk_chief.email),
  ]);
  const editorToken = await deskToken(baseUrl, demo.science_editor.email);
  const placed: Placed[] = [];
  const place = (field: string, ...texts: string[]) =>
    texts.forEach((text) => placed.push({ field, text }));

  const people = await chief<UsersListResponse>('GET', '/users');
  const idOf = (email: string) => people.items.find((user) => user.email === email)!;

  // People's names: the reporter's own, and one invitation per payload.
  const reporterName = corpus.find((payload) => payload.id === 'i1')!.text;
  const reporterRow = idOf(demo.reporter.email);
  await chief('PATCH', `/users/${reporterRow.id}`, {
    displayName: reporterName,
    version: reporterRow.version,
  });
  place('user.displayName', reporterName);
  for (const [index, payload] of corpus.entries()) {
    await chief('POST', '/users/invitations', {
      email: `hostile-${index}@marrowby-gazette.test`,
      displayName: payload.text,
      role: 'reporter',
    });
    place('invitation.displayName', payload.text);
  }

  // Rating levels: one per payload that fits a label, and one rating the verdicts use.
  const levels = await chief<RatingLevelView[]>('GET', '/rating-levels');
  const freeNumber = Math.max(...levels.map((level) => level.number ?? 0)) + 1;
  const letters = (index: number) =>
    String.fromCharCode(97 + Math.floor(index / 26), 97 + (index % 26));
  for (const [index, payload] of fitting(60).entries()) {
    await chief('POST', '/rating-levels', {
      id: `hostile-${letters(index)}`,
      number: index === 0 ? freeNumber : null,
      label: payload.text,
      description: payload.text,
      isRating: index === 0,
    });
    place('ratingLevel.label', payload.text);
    place('ratingLevel.description', payload.text);
  }
  const ratingId = 'hostile-aa';

  // A claim per payload, filed by the reporter.
  const perPayload: PlantedDesk['perPayload'] = [];
  for (const [index, payload] of corpus.entries()) {
    const claim = await reporter<ClaimDetail>('POST', '/claims', {
      text: payload.text,
      summary: payload.text,
      topics: ['hostile'],
      claimant: {
        name: payload.text,
        kind: 'public_figure',
        affiliation: payload.text,
        notes: payload.text,
      },
      firstAppearance: {
        url: hostileWebUrls[index]!.text,
        outlet: payload.text,
        seenAt,
        seenTimeZone: london,
        isFirstKnown: true,
      },
    });
    perPayload.push({ payload, id: claim.id });
  }
  place('claim.text', ...corpus.map((payload) => payload.text));
  place('claim.summary', ...corpus.map((payload) => payload.text));
  place('claimant.name', ...corpus.map((payload) => payload.text));
  place('claimant.affiliation', ...corpus.map((payload) => payload.text));
  place('claimant.notes', ...corpus.map((payload) => payload.text));
  place('appearance.outlet', ...corpus.map((payload) => payload.text));
  place('appearance.url', ...hostileWebUrls.map((url) => url.text));

  // No URL field takes a script or document address.
  const [first] = perPayload;
  for (const url of scriptUrls) {
    await expectRefused(
      reporter('POST', `/claims/${first!.id}/appearances`, {
        url,
        outlet: 'x',
        seenAt,
        seenTimeZone: london,
      }),
      'url',
    );
    await expectRefused(
      editor('POST', `/claims/${first!.id}/sources`, {
        source: { title: 'x', url, kind: 'news_report', grade: 'weak', gradeReason: 'x' },
      }),
      'url',
    );
  }

  const detail = (id: string) => copy<ClaimDetail>('GET', `/claims/${id}`);
  const take = async (id: string) => {
    const claim = await detail(id);
    await editor('POST', `/claims/${id}/assign`, {
      assigneeId: idOf(demo.science_editor.email).id,
      version: claim.version,
    });
  };
  const move = async (who: DeskApi, id: string, to: string, note?: string) =>
    who('POST', `/claims/${id}/transitions`, {
      to,
      ...(note ? { note } : {}),
      version: (await detail(id)).version,
    });
  const citeSource = async (id: string, payload: Payload, index: number) =>
    (
      await editor<{ id: string }>('POST', `/claims/${id}/sources`, {
        source: {
          title: payload.text,
          authors: payload.text,
          publisher: payload.text,
          url: hostileWebUrls[index]!.text,
          ...(/\s/.test(payload.text) ? {} : { doi: `10.5555/${payload.text}` }),
          kind: 'news_report',
          grade: index === 0 ? 'strong' : 'adequate',
          gradeReason: payload.text,
        },
      })
    ).id;
  const draft = async (id: string, fields: object) => {
    const version = await editor<VerdictVersionView>('POST', `/claims/${id}/verdict/versions`, {});
    await editor('PATCH', `/claims/${id}/verdict/versions/${version.id}`, {
      version: version.version,
      ...fields,
    });
  };

  // The claim to publish: every part of it hostile, its text the whole corpus.
  const published = perPayload[0]!.id;
  await reporter('PATCH', `/claims/${published}`, {
    text: joined(4000),
    version: (await detail(published)).version,
  });
  place('claim.text', joined(4000));
  await take(published);
  const sourceIds: string[] = [];
  for (const [index, payload] of corpus.entries()) {
    await editor('POST', `/claims/${published}/appearances`, {
      url: hostileWebUrls[index]!.text,
      outlet: payload.text,
      seenAt,
      seenTimeZone: london,
    });
    sourceIds.push(await citeSource(published, payload, index));
    await editor('POST', `/claims/${published}/reply-attempts`, {
      contacted: payload.text,
      contactedAt: seenAt,
      channel: 'email',
      outcome: 'replied',
      reply: payload.text,
    });
    await editor('POST', `/claims/${published}/consultations`, {
      name: payload.text,
      affiliation: payload.text,
      field: payload.text,
      quote: payload.text,
      consultedOn: '2026-11-21',
      declaredConflicts: payload.text,
      independentOfClaimant: true,
    });
    await reporter('POST', `/claims/${published}/comments`, { body: payload.text });
  }
  const texts = corpus.map((payload) => payload.text);
  place('appearance.outlet', ...texts);
  place('appearance.url', ...hostileWebUrls.map((url) => url.text));
  for (const field of ['title', 'authors', 'publisher', 'gradeReason']) {
    place(`source.${field}`, ...texts);
  }
  place('source.url', ...hostileWebUrls.map((url) => url.text));
  place('source.doi', ...corpus.filter((p) => !/\s/.test(p.text)).map((p) => `10.5555/${p.text}`));
  place('replyAttempt.contacted', ...texts);
  place('replyAttempt.reply', ...texts);
  for (const field of ['name', 'affiliation', 'field', 'quote', 'declaredConflicts']) {
    place(`consultation.${field}`, ...texts);
  }
  place('comment.body', ...texts);

  const workingNote = joined(2000);
  const working = await editor<{ id: string }>('POST', `/claims/${published}/workings`, {
    calculatorId: 'heat-flux-compare',
    inputs: {},
    note: workingNote,
  });
  place('working.note', workingNote);

  // Evidence files named with the corpus; their bytes are clean (hostile bytes are refused:
  // apps/api/test/hostile-uploads.e2e-spec.ts).
  const fileNames: string[] = [];
  for (const payload of corpus) {
    const stored = await upload<AttachmentView>(
      baseUrl,
      editorToken,
      `/claims/${published}/attachments`,
      Buffer.from(evidenceNotes),
      `${payload.text}.txt`,
    );
    fileNames.push(stored.originalName);
  }
  place('attachment.originalName', ...fileNames);
  const capture = await upload<AttachmentView>(
    baseUrl,
    editorToken,
    `/claims/${published}/attachments`,
    onePixelPng,
    `${corpus[3]!.text}.png`,
  );
  fileNames.push(capture.originalName);
  const firstAppearance = (await detail(published)).appearances.find((a) => a.isFirstKnown)!;
  await editor('PATCH', `/claims/${published}/appearances/${firstAppearance.id}`, {
    captureAttachmentId: capture.id,
    version: firstAppearance.version,
  });

  const verdictFields = (sourceId: string, workingId?: string) => ({
    ratingId,
    bottomLine: joined(1200),
    primarySourceId: sourceId,
    body: hostileDocument(sourceId, workingId),
  });
  place('verdict.bottomLine', joined(1200));
  place('verdict.body', ...texts);

  const sendBackNote = joined(2000);
  await draft(published, verdictFields(sourceIds[0]!, working.id));
  await move(editor, published, 'awaiting_signoff');
  await move(copy, published, 'sent_back', sendBackNote);
  place('signoff.note', sendBackNote);
  await move(editor, published, 'in_research');
  await draft(published, {});
  await move(editor, published, 'awaiting_signoff');
  await move(copy, published, 'cleared');
  const [firstPublication] = await copy<PublicationView[]>('POST', `/claims/${published}/publish`, {
    version: (await detail(published)).version,
  });
  const slug = /\/explainers\/([^/]+)\//.exec(firstPublication!.url)![1]!;

  // A correction with a hostile update note.
  const correctionNote = joined(2000);
  await move(editor, published, 'in_research');
  await draft(published, { bottomLine: joined(1200, ' ') });
  await move(editor, published, 'awaiting_signoff');
  await move(copy, published, 'cleared');
  await copy('POST', `/claims/${published}/publish`, {
    version: (await detail(published)).version,
    note: { kind: 'correction', text: correctionNote },
  });
  place('publication.note', correctionNote);

  // A claim awaiting sign-off of its second version, its right of reply waived.
  const awaitingSignoff = perPayload[1]!.id;
  await take(awaitingSignoff);
  const signoffSource = await citeSource(awaitingSignoff, corpus[1]!, 0);
  const waiver = joined(1000);
  const chiefToken = await deskToken(baseUrl, demo.desk_chief.email);
  const waived = await fetch(`${baseUrl}/api/claims/${awaitingSignoff}/reply-waiver`, {
    method: 'PUT',
    headers: { Authorization: `Bearer ${chiefToken}`, 'Content-Type': 'application/json' },
    body: JSON.stringify({ reason: waiver, version: (await detail(awaitingSignoff)).version }),
  });
  expect(waived.status).toBe(204);
  place('replyWaiver.reason', waiver);
  await draft(awaitingSignoff, verdictFields(signoffSource));
  await move(editor, awaitingSignoff, 'awaiting_signoff');
  await move(copy, awaitingSignoff, 'sent_back', sendBackNote);
  await move(editor, awaitingSignoff, 'in_research');
  await draft(awaitingSignoff, { bottomLine: joined(1200, ' ') });
  await move(editor, awaitingSignoff, 'awaiting_signoff');

  // A claim with the hostile draft open.
  const drafting = perPayload[2]!.id;
  await take(drafting);
  await draft(drafting, verdictFields(await citeSource(drafting, corpus[2]!, 0)));

  // A claim set aside with a hostile note.
  const setAside = perPayload[3]!.id;
  const setAsideNote = joined(2000);
  await chief('POST', `/claims/${setAside}/transitions`, {
    to: 'set_aside',
    reason: 'out_of_scope',
    note: setAsideNote,
    version: (await detail(setAside)).version,
  });
  place('setAside.note', setAsideNote);

  // Datasets named and described with the corpus.
  const datasetIds: string[] = [];
  for (const payload of corpus) {
    const uploaded = await upload<DatasetUploadView>(
      baseUrl,
      editorToken,
      '/datasets/uploads',
      Buffer.from(datasetCsv),
      'anomalies.csv',
    );
    const dataset = await editor<DatasetDetail>('POST', '/datasets', {
      attachmentId: uploaded.attachment.id,
      name: payload.text,
      description: payload.text,
      timeColumn: 'year',
      valueColumns: [{ column: 'anomaly', unit: 'K', label: payload.text }],
    });
    datasetIds.push(dataset.id);
  }
  place('dataset.name', ...texts);
  place('dataset.description', ...texts);
  place('dataset.columnLabel', ...texts);

  return {
    perPayload,
    published: { id: published, slug, captureId: capture.id },
    awaitingSignoff,
    drafting,
    setAside,
    datasetIds,
    fileNames,
    reporterName,
    reporterId: reporterRow.id,
    placed,
  };
}
