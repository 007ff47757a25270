import { displayUnit, formatNumber } from '@skyledger/calc';
import { CartesianGrid, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { ChartFigure } from '@/components/ui/chart-figure';
import { formatDecimalYear } from '../decimal-year';
import { summariseSeries, thinSeries, type SeriesPoint } from '../series-summary';

/** More points than a chart this wide can show apart; the table and the CSV keep them all. */
const MAX_DRAWN_POINTS = 2000;

interface SeriesChartProps {
  label: string;
  unit: string;
  points: readonly SeriesPoint[];
  /** Where the rows a long table leaves out can be found. */
  restAt?: string;
}

/** One series against time: a line, its description in words and its values as a table. */
export function SeriesChart({ label, unit, points, restAt }: SeriesChartProps) {
  const shownUnit = displayUnit(unit);
  const drawn = thinSeries(points, MAX_DRAWN_POINTS);
  const heading = shownUnit ? `${label} (${shownUnit})` : label;
  return (
    <ChartFigure
      title={heading}
      summary={
        summariseSeries(label, unit, points) +
        (drawn.length < points.length
          ? ` The chart draws ${drawn.length} of the values, evenly spaced.`
          : '')
      }
      chart={
        <LineChart
          responsive
          data={drawn as SeriesPoint[]}
          style={{ width: '100%', height: 260 }}
          margin={{ top: 8, right: 16, bottom: 8, left: 8 }}
          accessibilityLayer={false}
        >
          <CartesianGrid stroke="var(--gray-5)" strokeDasharray="3 3" />
          <XAxis
            dataKey="t"
            type="number"
            domain={['dataMin', 'dataMax']}
            allowDecimals={false}
            tickFormatter={(t: number) => String(Math.round(t))}
            stroke="var(--gray-11)"
            fontSize={12}
          />
          <YAxis
            width={56}
            tickFormatter={(y: number) => formatNumber(y, 3)}
            stroke="var(--gray-11)"
            fontSize={12}
            label={
              shownUnit
                ? {
                    value: shownUnit,
                    angle: -90,
                    position: 'insideLeft',
                    fill: 'var(--gray-11)',
                    fontSize: 12,
                  }
                : undefined
            }
          />
          <Tooltip
            labelFormatter={(t) => formatDecimalYear(Number(t))}
            formatter={(y) => [
              `${formatNumber(Number(y))}${shownUnit ? ` ${shownUnit}` : ''}`,
              label,
            ]}
          />
          <Line
            type="linear"
            dataKey="y"
            name={label}
            stroke="var(--accent-10)"
            strokeWidth={1.75}
            dot={drawn.length <= 80 ? { r: 2 } : false}
            isAnimationActive={false}
          />
        </LineChart>
      }
      table={{
        columns: ['Time', heading],
        rows: points.map((point) => [
          formatDecimalYear(point.t),
          String(point.y).replace(/^-/, '−'),
        ]),
        restAt,
      }}
    />
  );
}
