import { Flex, Grid, Table, Text, VisuallyHidden } from '@radix-ui/themes';
import type { LinesInputSpec, WorksheetLineResult } from '@skyledger/calc';
import { TextAreaField } from '@/components/ui/text-area-field';

interface LinesInputProps {
  spec: LinesInputSpec;
  text: string;
  onChange: (text: string) => void;
  /** Each line's result or error from the last run, by line number. */
  lineResults: readonly WorksheetLineResult[] | undefined;
  error?: string;
}

/** The worksheet: lines of arithmetic on the left, each line's result or error beside it. */
export function LinesInput({ spec, text, onChange, lineResults, error }: LinesInputProps) {
  return (
    <Grid columns={{ initial: '1', sm: '2' }} gap="4" align="start">
      <TextAreaField
        label={spec.label}
        hint={spec.help}
        value={text}
        rows={Math.min(20, Math.max(6, text.split('\n').length + 1))}
        spellCheck={false}
        onChange={(event) => onChange(event.target.value)}
        error={error}
        className="sl-wb-mono"
      />
      <Flex direction="column" gap="1">
        <Text as="p" size="2" weight="bold">
          Line by line
        </Text>
        {lineResults && lineResults.length > 0 ? (
          <Table.Root size="1" variant="surface">
            <VisuallyHidden asChild>
              <caption>Results, line by line</caption>
            </VisuallyHidden>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Line</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Expression</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Result</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {lineResults.map((line) => (
                <Table.Row key={line.line}>
                  <Table.RowHeaderCell>{line.line}</Table.RowHeaderCell>
                  <Table.Cell className="sl-wb-mono sl-break">{line.expression}</Table.Cell>
                  <Table.Cell className="sl-break">
                    {line.ok ? (
                      <Text weight="bold">{line.text}</Text>
                    ) : (
                      <Text color="red">Error: {line.error}</Text>
                    )}
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        ) : (
          <Text size="2" color="gray">
            Results appear here as you type.
          </Text>
        )}
      </Flex>
    </Grid>
  );
}
