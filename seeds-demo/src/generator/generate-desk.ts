import { In, type DataSource } from 'typeorm';
import { BatchWriter } from './batch-writer';
import {
  claimantRows,
  claimRows,
  generatedPeople,
  type ClaimantRow,
  type DeskSpan,
  type PersonRow,
} from './desk-rows';
import { SeededRandom } from './random';
import { sourceRows, sourcesByTopic, type SourceRow } from './source-rows';
import { withVerdicts, type GeneratedClaim } from './verdict-rows';

export interface DeskOptions {
  claims: number;
  seed: number;
  /** The last filing date; fixed by default so a seed gives the same rows on any day. */
  until: Date;
  years: number;
  /** Published explainers among the claims; by default one claim in twenty. */
  explainers?: number;
}

export const deskDefaults = {
  seed: 1,
  until: new Date('2026-12-01T00:00:00Z'),
  years: 8,
} satisfies Partial<DeskOptions>;

/** Everything one run generates. Claims are produced lazily, in filing order of the stream. */
export interface GeneratedDesk {
  people: PersonRow[];
  claimants: ClaimantRow[];
  sources: SourceRow[];
  claims: Iterable<GeneratedClaim>;
}

/** A claimant makes about 20 claims on average, a source serves about 25. */
const claimantCount = (claims: number) => Math.max(10, Math.ceil(claims / 20));
const sourceCount = (claims: number) => Math.max(20, Math.ceil(claims / 25));
/** A desk publishes an explainer for about one claim in twenty it files. */
export const defaultExplainers = (claims: number) => Math.round(claims / 20);

/**
 * The generated desk as rows, a pure function of its options: the same seed gives the
 * same rows. `people` may be given with the ids they already have in the database.
 */
export function generatedDesk(
  options: DeskOptions,
  people = generatedPeople(SeededRandom.stream(options.seed, 'people'), options),
): GeneratedDesk {
  const span: DeskSpan = { until: options.until, years: options.years };
  const claimants = claimantRows(
    SeededRandom.stream(options.seed, 'claimants'),
    claimantCount(options.claims),
    span,
  );
  const library = sourceRows(SeededRandom.stream(options.seed, 'sources'), {
    ...span,
    count: sourceCount(options.claims),
    people,
  });
  const sources = library.map(({ source }) => source);
  const filed = claimRows(SeededRandom.stream(options.seed, 'claims'), {
    ...span,
    count: options.claims,
    claimants,
    people,
    sourcesByTopic: sourcesByTopic(library),
  });
  const stream = (name: 'workings' | 'verdicts' | 'signoffs' | 'publications') =>
    SeededRandom.stream(options.seed, name);
  return {
    people,
    claimants,
    sources,
    claims: withVerdicts(filed, {
      streams: {
        workings: stream('workings'),
        verdicts: stream('verdicts'),
        signoffs: stream('signoffs'),
        publications: stream('publications'),
      },
      explainers: options.explainers ?? defaultExplainers(options.claims),
      people,
      sources: new Map(sources.map((source) => [source.id, source])),
    }),
  };
}

/** The generator would not run: the database is not in a state it may write to. */
export class GeneratorRefusal extends Error {}

/** Entity names, parents first: the order rows are written in. */
const writeOrder = [
  'User',
  'Claimant',
  'Source',
  'Claim',
  'ClaimTopic',
  'ClaimSource',
  'Working',
  'VerdictVersion',
  'SignoffDecisionRecord',
  'Publication',
];

export interface GenerateResult {
  /** Rows written per entity. */
  written: Record<string, number>;
  seconds: number;
}

/**
 * Writes a generated desk into the database in one transaction, with multi-row INSERTs.
 * Refuses a database that already holds claims unless `append` is set; people are
 * matched by e-mail, so appending reuses the generated desk already there.
 */
export async function generateDesk(
  dataSource: DataSource,
  options: Partial<DeskOptions> & { claims: number; append?: boolean },
): Promise<GenerateResult> {
  const settings: DeskOptions = { ...deskDefaults, ...options };
  const started = performance.now();
  const written = await dataSource.transaction(async (manager) => {
    const [{ claims }] = (await manager.query('SELECT COUNT(*) AS claims FROM claims')) as [
      { claims: string },
    ];
    if (Number(claims) > 0 && !options.append) {
      throw new GeneratorRefusal(
        `The database already holds ${claims} claims: pass --append to add generated ones to them`,
      );
    }
    const fresh = generatedPeople(SeededRandom.stream(settings.seed, 'people'), settings);
    const existing = await manager.getRepository<Pick<PersonRow, 'id' | 'email'>>('User').find({
      select: { id: true, email: true },
      where: { email: In(fresh.map((person) => person.email)) },
    });
    const known = new Map(existing.map((user) => [user.email, user.id]));
    const people = fresh.map((person) => ({ ...person, id: known.get(person.email) ?? person.id }));
    const desk = generatedDesk(settings, people);
    if (await manager.exists('Claimant', { where: { id: desk.claimants[0]!.id } })) {
      throw new GeneratorRefusal(
        `Seed ${settings.seed} was generated into this database already: pass another --seed to add more`,
      );
    }

    const writer = new BatchWriter(manager, writeOrder);
    await writer.add(
      'User',
      people.filter((person) => !known.has(person.email)),
    );
    await writer.add('Claimant', desk.claimants);
    await writer.add('Source', desk.sources);
    for (const generated of desk.claims) {
      await writer.add('Claim', [generated.claim]);
      await writer.add('ClaimTopic', generated.topics);
      await writer.add('ClaimSource', generated.sourceLinks);
      await writer.add('Working', generated.workings);
      await writer.add('VerdictVersion', generated.verdictVersions);
      await writer.add('SignoffDecisionRecord', generated.signoffDecisions);
      await writer.add('Publication', generated.publications);
    }
    await writer.flush();
    return writer.written;
  });
  return { written, seconds: (performance.now() - started) / 1000 };
}
