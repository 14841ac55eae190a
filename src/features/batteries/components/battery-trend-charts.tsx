/**
 * The voltage and resistance trends, drawn with recharts. Loaded lazily (see battery-trends.tsx):
 * recharts and its d3 parts are fetched only when a battery page opens.
 */
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis, type DotItemDotProps, type TooltipContentProps, type TooltipValueType } from 'recharts';
import type { BatterySettings, HealthJson } from '@shared/domain/battery-state';
import type { ReadingJson } from '@shared/schemas/batteries';
import { formatMilliohm, formatPercent, formatVolts } from './battery-format';
import { resistanceLines, voltageLines, type TrendLine } from './trend-lines';

interface Point {
  at: number;
  volts: number;
  milliohm: number;
  percent: number;
  reliable: boolean;
}

const TONE_STROKE: Record<TrendLine['tone'], string> = {
  muted: 'var(--color-ink-muted)',
  warning: 'var(--color-warning)',
  danger: 'var(--color-danger)',
};

const tick = { fill: 'var(--color-ink-muted)', fontSize: 14 };
const HALF_HOUR = 30 * 60_000;

const timeOnly = new Intl.DateTimeFormat(undefined, { hour: 'numeric', minute: '2-digit' });
const dayAndTime = new Intl.DateTimeFormat(undefined, { weekday: 'short', hour: 'numeric', minute: '2-digit' });
// Over a week a weekday repeats and would name two days alike: the date says which.
const dateOnly = new Intl.DateTimeFormat(undefined, { month: 'short', day: 'numeric' });
const dateAndTime = new Intl.DateTimeFormat(undefined, { month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit' });
const WEEK = 7 * 24 * 60 * 60_000;

/**
 * A rested reading is a filled dot; one without 4 h of rest a hollow diamond, larger, in the
 * warning colour: the shape tells them apart in glare and for colour-blind readers.
 */
function ReadingDot({ cx, cy, payload }: DotItemDotProps) {
  if (typeof cx !== 'number' || typeof cy !== 'number') return null;
  if ((payload as Point).reliable) return <circle cx={cx} cy={cy} r={5} fill="var(--color-accent)" stroke="var(--color-surface)" strokeWidth={1.5} />;
  return <path d={`M${cx} ${cy - 7}L${cx + 7} ${cy}L${cx} ${cy + 7}L${cx - 7} ${cy}Z`} fill="var(--color-surface)" stroke="var(--color-warning)" strokeWidth={2.5} />;
}

function ReadingTooltip({ active, payload }: TooltipContentProps<TooltipValueType, number | string>) {
  const point = active ? (payload?.[0]?.payload as Point | undefined) : undefined;
  if (!point) return null;
  return (
    <div className="rounded-lg border border-line-strong bg-surface px-3 py-2 text-sm text-ink shadow-md">
      <p className="font-semibold">{dateAndTime.format(point.at)}</p>
      <p className="tabular-nums">
        {formatVolts(point.volts)} · {formatMilliohm(point.milliohm)} · {formatPercent(point.percent)}
      </p>
      {!point.reliable && <p className="font-semibold text-warning">Not rested 4 h: charge not reliable</p>}
    </div>
  );
}

function TrendChart({ title, points, dataKey, lines, formatValue }: {
  title: string;
  points: Point[];
  dataKey: 'volts' | 'milliohm';
  lines: TrendLine[];
  formatValue?: (value: number) => string;
}) {
  const first = points[0].at;
  const last = points[points.length - 1].at;
  // One reading, or several in the same minute: give the axis some width to draw in.
  const timeDomain = last - first < HALF_HOUR ? [first - HALF_HOUR, last + HALF_HOUR] : [first, last];
  const spansDays = new Date(timeDomain[0]).toDateString() !== new Date(timeDomain[1]).toDateString();
  const axisFormat = timeDomain[1] - timeDomain[0] >= WEEK ? dateOnly : spansDays ? dayAndTime : timeOnly;

  return (
    <figure className="flex min-w-0 flex-col gap-2">
      <figcaption className="text-lg font-bold">{title}</figcaption>
      <ResponsiveContainer width="100%" height={240}>
        <LineChart data={points} margin={{ top: 8, right: 16, bottom: 0, left: 0 }}>
          <CartesianGrid stroke="var(--color-line)" strokeDasharray="3 3" />
          <XAxis
            dataKey="at"
            type="number"
            scale="time"
            domain={timeDomain}
            tickCount={4}
            tick={tick}
            stroke="var(--color-line-strong)"
            tickFormatter={(at: number) => axisFormat.format(at)}
          />
          {/* Round ticks around the readings, widened to take in every threshold line (extendDomain below). */}
          <YAxis domain={['auto', 'auto']} tick={tick} width={52} stroke="var(--color-line-strong)" tickFormatter={formatValue} />
          {lines.map((line) => (
            <ReferenceLine
              key={line.label}
              y={line.value}
              ifOverflow="extendDomain"
              stroke={TONE_STROKE[line.tone]}
              strokeDasharray="6 4"
              strokeWidth={1.5}
              // A halo in the surface colour keeps the words readable where they cross the trend line.
              // For a line, recharts puts "insideBottom" words over it and "insideTop" words under it.
              label={{
                value: line.label,
                position: line.labelBelow ? 'insideTopRight' : 'insideBottomRight',
                fill: TONE_STROKE[line.tone],
                fontSize: 13,
                fontWeight: 600,
                stroke: 'var(--color-surface)',
                strokeWidth: 4,
                paintOrder: 'stroke',
              }}
            />
          ))}
          <Tooltip content={ReadingTooltip} />
          <Line dataKey={dataKey} type="linear" stroke="var(--color-accent)" strokeWidth={2.5} dot={ReadingDot} activeDot={{ r: 7 }} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}

/** Without the team's settings (still loading, or failed) the charts draw no threshold lines. */
export default function BatteryTrendCharts({ readings, health, settings }: { readings: ReadingJson[]; health: HealthJson; settings: BatterySettings | null }) {
  const points: Point[] = readings
    .map((reading) => ({
      at: Date.parse(reading.takenAt),
      volts: reading.voltage,
      milliohm: reading.internalResistanceMilliohm,
      percent: reading.stateOfChargePercent,
      reliable: reading.reliable,
    }))
    .sort((a, b) => a.at - b.at);
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <TrendChart title="Voltage (V)" points={points} dataKey="volts" lines={settings ? voltageLines(settings) : []} formatValue={(volts) => volts.toFixed(2)} />
      <TrendChart title="Internal resistance (mΩ)" points={points} dataKey="milliohm" lines={settings ? resistanceLines(health, settings) : []} />
    </div>
  );
}
