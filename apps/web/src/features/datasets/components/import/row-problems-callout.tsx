import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Callout, Flex, Text } from '@radix-ui/themes';
import type { RowProblem } from '../../forms/row-problems';

/** Problems listed one by one; a file with more is summed up after them. */
const LISTED = 50;

function where({ line, column }: RowProblem): string {
  if (line === 1) return column ? `Header, column “${column}”` : 'Header';
  return column ? `Line ${line}, column “${column}”` : `Line ${line}`;
}

/** Why the API refused the file: each bad line and column in words. Nothing was imported. */
export function RowProblemsCallout({ problems }: { problems: readonly RowProblem[] }) {
  const listed = problems.slice(0, LISTED);
  const lines = new Set(problems.map((problem) => problem.line)).size;
  return (
    <Callout.Root color="red" role="alert">
      <Callout.Icon>
        <ExclamationTriangleIcon aria-hidden />
      </Callout.Icon>
      <Flex direction="column" gap="2">
        <Callout.Text weight="bold">
          Nothing was imported: {lines === 1 ? 'one line' : `${lines} lines`} of the file{' '}
          {lines === 1 ? 'has a problem' : 'have problems'}.
        </Callout.Text>
        <ul className="sl-list" aria-label="Problems in the file">
          {listed.map((problem) => (
            <li key={`${problem.line}:${problem.column ?? ''}`}>
              <Text size="2">
                <Text weight="bold">{where(problem)}</Text>: {problem.problem}
              </Text>
            </li>
          ))}
        </ul>
        {problems.length > listed.length ? (
          <Text size="2">And {problems.length - listed.length} more problems.</Text>
        ) : null}
        <Text size="2">
          Correct the file, upload it again above and import it; your choices below are kept.
        </Text>
      </Flex>
    </Callout.Root>
  );
}
