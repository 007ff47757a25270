import { type ReliabilityGrade, type SourceKind } from '@skyledger/contracts';
import { type DeskSpan, type PersonRow, GENERATED_EMAIL_DOMAIN, spanStart } from './desk-rows';
import { type SeededRandom } from './random';
import {
  claimPatterns,
  familyNames,
  givenNames,
  gradeReasons,
  places,
  sourcePatterns,
} from './vocabulary';

/** A source and the topic it was made for (which claims may cite it). */
export interface TopicSource {
  topic: string;
  source: SourceRow;
}

export interface SourceRow {
  id: string;
  title: string;
  authors: string | null;
  publisher: string;
  year: number;
  doi: string | null;
  url: string | null;
  accessedOn: string;
  kind: SourceKind;
  grade: ReliabilityGrade;
  gradeReason: string;
  createdById: string;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

/** Every topic a generated claim is filed under by its pattern. */
export const patternTopics: readonly string[] = [
  ...new Set(claimPatterns.flatMap((pattern) => pattern.topics)),
];

/**
 * The desk's library of invented sources, on the claim patterns' topics. DOIs use the
 * 10.5555 prefix Crossref keeps for examples, web addresses a `.test` host: neither
 * resolves to anything real.
 */
export function sourceRows(
  random: SeededRandom,
  options: DeskSpan & { count: number; people: readonly PersonRow[] },
): TopicSource[] {
  const editors = options.people.filter((person) => person.role === 'science_editor');
  if (editors.length === 0) throw new Error('sourceRows needs at least one science editor');
  const patternWeights = Object.fromEntries(
    sourcePatterns.map((pattern, index) => [String(index), pattern.weight]),
  );
  const added = spanStart(options);
  const lastYear = options.until.getUTCFullYear() - 1;
  return Array.from({ length: options.count }, () => {
    const pattern = sourcePatterns[Number(random.weighted(patternWeights))]!;
    const topic = random.pick(patternTopics);
    const year = lastYear - random.below(30);
    const grade = random.weighted(pattern.grades as Record<ReliabilityGrade, number>);
    const id = random.uuid();
    const author = () => `${random.pick(familyNames)}, ${random.pick(givenNames)[0]}.`;
    const authors =
      pattern.cited === 'doi'
        ? Array.from({ length: 1 + random.below(4) }, author).join('; ')
        : pattern.kind === 'expert_interview'
          ? author()
          : null;
    const accessed = new Date(
      added.getTime() + random.below(options.until.getTime() - added.getTime()),
    );
    const source: SourceRow = {
      id,
      title: pattern.title
        .replaceAll('{topic}', topic.replaceAll('-', ' '))
        .replaceAll('{place}', random.pick(places))
        .replaceAll('{year}', String(year)),
      authors,
      publisher: random.pick(pattern.publishers),
      year,
      doi: pattern.cited === 'doi' ? `10.5555/generated.${id.slice(0, 8)}` : null,
      url: pattern.cited === 'url' ? `https://sources.${GENERATED_EMAIL_DOMAIN}/${id}` : null,
      accessedOn: accessed.toISOString().slice(0, 10),
      kind: pattern.kind,
      grade,
      gradeReason: `${gradeReasons[grade]} (Generated source; invented.)`,
      createdById: random.pick(editors).id,
      createdAt: added,
      updatedAt: added,
      version: 1,
    };
    return { topic, source };
  });
}

/** Sources grouped by the topic they were made for. */
export function sourcesByTopic(sources: readonly TopicSource[]): Map<string, SourceRow[]> {
  const byTopic = new Map<string, SourceRow[]>();
  for (const { topic, source } of sources) {
    const shelf = byTopic.get(topic) ?? [];
    shelf.push(source);
    byTopic.set(topic, shelf);
  }
  return byTopic;
}
