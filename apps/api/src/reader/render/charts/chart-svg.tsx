import { formatNumber } from '@skyledger/calc';
import { quantityText } from '../format.js';
import { valueScale, wantsLogScale, type ValueScale } from './chart-scale.js';
import {
  type BarsChart,
  type ChartRow,
  type LineChart,
  type RangesChart,
  type WorkingChart,
} from './working-charts.js';

// Drawn in a 360-unit-wide box that the stylesheet scales to the column's width.
const width = 360;
const padX = 12;
const rowHeight = 44;
const axisHeight = 26;

const tick = (value: number) => formatNumber(value, 3);

/** Tick labels near an end of the axis are anchored inward so they stay inside the box. */
function anchorAt(x: number, start: number, end: number): 'start' | 'middle' | 'end' {
  return x - start < 14 ? 'start' : end - x < 14 ? 'end' : 'middle';
}

/** Vertical grid lines with their labels under the rows, and a dashed line at zero. */
function ValueAxis({ scale, top, bottom }: { scale: ValueScale; top: number; bottom: number }) {
  const [first, last] = [scale.ticks[0] ?? 0, scale.ticks[scale.ticks.length - 1] ?? 0];
  return (
    <g className="ax">
      {scale.ticks.map((value) => (
        <g key={value}>
          <line className="grid" x1={scale.at(value)} x2={scale.at(value)} y1={top} y2={bottom} />
          <text
            x={scale.at(value)}
            y={bottom + 16}
            textAnchor={anchorAt(scale.at(value), padX, width - padX)}
          >
            {tick(value)}
          </text>
        </g>
      ))}
      {!scale.log && first < 0 && last > 0 ? (
        <line className="zero" x1={scale.at(0)} x2={scale.at(0)} y1={top} y2={bottom} />
      ) : null}
    </g>
  );
}

function Whisker({
  scale,
  low,
  high,
  y,
}: {
  scale: ValueScale;
  low: number;
  high: number;
  y: number;
}) {
  const [x1, x2] = [scale.at(low), scale.at(high)];
  return <path className="whisker" d={`M${x1} ${y - 5}v10M${x1} ${y}H${x2}M${x2} ${y - 5}v10`} />;
}

const rowValues = (rows: readonly ChartRow[]) =>
  rows.flatMap((row) => [row.value, row.low ?? row.value, row.high ?? row.value]);

/** Whether a ranges chart draws an axis under each row rather than one for all. */
const axisPerRow = (chart: RangesChart | BarsChart) => chart.kind === 'ranges' && !chart.sharedAxis;

/**
 * One row per value: its label and number, then a bar (bars) or a dot on its range
 * (ranges), on one axis for all rows or, for rows in different units, an axis each.
 */
function RowsDrawing({ chart }: { chart: RangesChart | BarsChart }) {
  const perRow = axisPerRow(chart);
  const scaleOf = (rows: readonly ChartRow[], log: boolean) =>
    valueScale(rowValues(rows), [padX, width - padX], { log, includeZero: chart.kind === 'bars' });
  const shared = perRow ? null : scaleOf(chart.rows, chart.log);
  const step = perRow ? rowHeight + axisHeight : rowHeight;
  return (
    <>
      {shared ? (
        <ValueAxis scale={shared} top={4} bottom={4 + chart.rows.length * rowHeight} />
      ) : null}
      {chart.rows.map((row, index) => {
        const y = 4 + index * step;
        const markY = y + 31;
        const scale = shared ?? scaleOf([row], wantsLogScale(rowValues([row])));
        const base = scale.at(scale.floor);
        const end = scale.at(row.value);
        return (
          <g key={index}>
            {perRow ? <ValueAxis scale={scale} top={y + 20} bottom={y + 42} /> : null}
            <text x={padX} y={y + 15}>
              {`${row.label}: ${quantityText(row.value, row.unit ?? chart.unit)}`}
            </text>
            {chart.kind === 'bars' ? (
              <rect
                className={row.reference ? 'ref' : 'mark'}
                x={Math.min(base, end)}
                y={markY - 7}
                width={Math.max(Math.abs(end - base), 1)}
                height={14}
              />
            ) : null}
            {row.low !== undefined && row.high !== undefined ? (
              <Whisker scale={scale} low={row.low} high={row.high} y={markY} />
            ) : null}
            {chart.kind === 'ranges' ? <circle className="mark" cx={end} cy={markY} r={5} /> : null}
          </g>
        );
      })}
    </>
  );
}

const lineBox = { height: 220, left: 48, right: 12, top: 10, bottom: 44 };

/** A line through the points, with the interval shaded behind it. */
function LineDrawing({ chart }: { chart: LineChart }) {
  const { height, left, right, top, bottom } = lineBox;
  const { points } = chart;
  const x = valueScale(
    points.map((point) => point.x),
    [left, width - right],
    { tight: true },
  );
  const y = valueScale(
    points.flatMap((point) => [point.y, point.low ?? point.y, point.high ?? point.y]),
    [height - bottom, top],
  );
  const path = (pairs: Array<[number, number]>) =>
    pairs.map(([px, py]) => `${px.toFixed(1)},${py.toFixed(1)}`).join(' ');
  const banded = points.every((point) => point.low !== undefined && point.high !== undefined);
  const [yFirst, yLast] = [y.ticks[0] ?? 0, y.ticks[y.ticks.length - 1] ?? 0];
  return (
    <>
      <g className="ax">
        {y.ticks.map((value) => (
          <g key={value}>
            <line className="grid" x1={left} x2={width - right} y1={y.at(value)} y2={y.at(value)} />
            <text x={left - 6} y={y.at(value) + 4} textAnchor="end">
              {tick(value)}
            </text>
          </g>
        ))}
        {x.ticks.map((value) => (
          <text
            key={value}
            x={x.at(value)}
            y={height - bottom + 18}
            textAnchor={anchorAt(x.at(value), left, width - right)}
          >
            {tick(value)}
          </text>
        ))}
        <path d={`M${left} ${height - bottom}H${width - right}`} />
        <text x={(left + width - right) / 2} y={height - 6} textAnchor="middle">
          {chart.xLabel}
        </text>
        {yFirst < 0 && yLast > 0 ? (
          <line className="zero" x1={left} x2={width - right} y1={y.at(0)} y2={y.at(0)} />
        ) : null}
      </g>
      {banded ? (
        <polygon
          className="band"
          points={path([
            ...points.map((point): [number, number] => [x.at(point.x), y.at(point.high!)]),
            ...points
              .toReversed()
              .map((point): [number, number] => [x.at(point.x), y.at(point.low!)]),
          ])}
        />
      ) : null}
      <polyline
        className="trace"
        points={path(points.map((point) => [x.at(point.x), y.at(point.y)]))}
      />
    </>
  );
}

/** The height of a chart's drawing in the 360-unit-wide box. */
function heightOf(chart: WorkingChart): number {
  if (chart.kind === 'line') return lineBox.height;
  return axisPerRow(chart)
    ? 4 + chart.rows.length * (rowHeight + axisHeight)
    : 4 + chart.rows.length * rowHeight + axisHeight;
}

/** A chart as inline SVG: an image whose text alternative is the chart's summary. */
export function ChartSvg({ chart, id }: { chart: WorkingChart; id: string }) {
  return (
    <svg
      viewBox={`0 0 ${width} ${heightOf(chart)}`}
      role="img"
      aria-labelledby={`${id}-alt`}
      xmlns="http://www.w3.org/2000/svg"
    >
      <title id={`${id}-alt`}>{chart.summary}</title>
      {chart.kind === 'line' ? <LineDrawing chart={chart} /> : <RowsDrawing chart={chart} />}
    </svg>
  );
}
