import { displayUnit, formatNumber } from '@skyledger/calc';
import { type ReaderWorking, type ReaderWorkingOutput } from '@skyledger/contracts';
import { ChartSvg } from './charts/chart-svg.js';
import { workingCharts, type WorkingChart } from './charts/working-charts.js';
import { DataTable } from './data-table.js';
import { quantityText } from './format.js';
import { readerPaths } from './page.js';

const notShown = '—';

function valueText(output: ReaderWorkingOutput): string {
  if (output.kind === 'number' && typeof output.value === 'number') {
    return output.band
      ? `${quantityText(output.band.p50, output.unit)} (median)`
      : quantityText(output.value, output.unit);
  }
  if (output.kind === 'list' && Array.isArray(output.value)) {
    const unit = displayUnit(output.unit);
    return `${output.value.map((value) => formatNumber(Number(value))).join(', ')}${unit ? ` ${unit}` : ''}`;
  }
  return notShown;
}

function rangeText(output: ReaderWorkingOutput): string {
  return output.band
    ? `${quantityText(output.band.p5, output.unit)} to ${quantityText(output.band.p95, output.unit)}`
    : notShown;
}

function ChartFigure({ chart, id }: { chart: WorkingChart; id: string }) {
  return (
    <figure className="chart">
      <figcaption>
        <strong>{chart.title}</strong>
      </figcaption>
      <ChartSvg chart={chart} id={id} />
      <details>
        <summary>The numbers in this chart</summary>
        <DataTable
          caption={`${chart.title}: the numbers`}
          captionHidden
          columns={chart.table.columns}
          rows={chart.table.rows}
        />
      </details>
    </figure>
  );
}

function Results({ working, charted }: { working: ReaderWorking; charted: ReadonlySet<string> }) {
  const quantities = working.outputs.filter(
    (output) => output.kind === 'number' || output.kind === 'list',
  );
  const banded = quantities.some((output) => output.band);
  return (
    <>
      {quantities.length > 0 ? (
        <DataTable
          caption={`Results of ${working.title}`}
          captionHidden
          columns={['Result', 'Value', ...(banded ? ['5th to 95th percentile'] : [])]}
          rows={quantities.map((output) => [
            output.label,
            valueText(output),
            ...(banded ? [rangeText(output)] : []),
          ])}
        />
      ) : null}
      {working.outputs
        .filter((output) => output.kind === 'text')
        .map((output) => (
          <p key={output.name}>
            <strong>{output.label}.</strong> {String(output.value)}
          </p>
        ))}
      {working.outputs
        .filter((output) => output.kind === 'table' && !charted.has(output.name))
        .map((output) => {
          const columns = output.columns ?? [];
          const rows = (Array.isArray(output.value) ? output.value : []) as Array<
            Record<string, unknown>
          >;
          return (
            <DataTable
              key={output.name}
              caption={output.label}
              columns={columns.map((column) =>
                column.unit ? `${column.label} (${displayUnit(column.unit)})` : column.label,
              )}
              rows={rows.map((row) =>
                columns.map((column) => {
                  const value = row[column.key];
                  return typeof value === 'number'
                    ? formatNumber(value)
                    : String(value ?? notShown);
                }),
              )}
            />
          );
        })}
    </>
  );
}

/**
 * One working as a reader sees it: what was computed, from which inputs and their
 * sources, step by step, the results with their bands, the charts with their numbers,
 * and the limits of the estimate. `id` is unique on the page.
 */
export function WorkingView({ working, id }: { working: ReaderWorking; id: string }) {
  const charts = workingCharts(working);
  const charted = new Set(
    charts.flatMap((chart) => (chart.tableOutput ? [chart.tableOutput] : [])),
  );
  return (
    <section className="working" id={id} aria-labelledby={`${id}-title`}>
      <h3 id={`${id}-title`}>Working: {working.title}</h3>
      <p className="meta">
        A back-of-envelope estimate, recomputed by our server with the {working.calculatorId}{' '}
        calculator (library version {working.libraryVersion}).{' '}
        <a href={`${readerPaths.methodology}#workings`}>What our workings can and cannot show</a>
      </p>
      {working.note ? <p>{working.note}</p> : null}
      <h4>Inputs</h4>
      <DataTable
        caption={`Inputs of ${working.title}`}
        captionHidden
        columns={['Input', 'Value', 'Source of the value']}
        rows={working.inputs.map((input) => [
          input.label,
          input.value,
          input.source ?? 'Set by the desk for this check',
        ])}
        numericColumns={[1]}
      />
      <h4>Steps</h4>
      <ol className="steps">
        {working.steps.map((step, index) => (
          <li key={index}>
            {step.text}: <code>{step.formula}</code> = <strong>{step.result}</strong>
          </li>
        ))}
      </ol>
      <h4>Results</h4>
      <Results working={working} charted={charted} />
      {charts.map((chart, index) => (
        <ChartFigure key={index} chart={chart} id={`${id}-chart-${index + 1}`} />
      ))}
      {working.cautions.length > 0 ? (
        <div className="caution" role="note">
          <strong>Limits of this estimate</strong>
          <ul>
            {working.cautions.map((caution, index) => (
              <li key={index}>{caution}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
