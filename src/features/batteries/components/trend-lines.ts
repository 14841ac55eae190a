import { SOC_TABLES, type BatterySettings, type HealthJson } from '@shared/domain/battery-state';

export interface TrendLine {
  value: number;
  /** Written on the line: its meaning never rests on its colour. */
  label: string;
  tone: 'muted' | 'warning' | 'danger';
  /** Words under the line rather than over it: the baseline, which lies close under the watch line. */
  labelBelow?: boolean;
}

/** The resting voltage that reads as `percent` in the team's table (the inverse of its interpolation). */
export function voltsAtPercent(percent: number, settings: Pick<BatterySettings, 'socTable'>): number {
  const table = SOC_TABLES[settings.socTable];
  const upper = table.findIndex((point) => point.percent >= percent);
  if (upper <= 0) return table[Math.max(upper, 0)].volts;
  const low = table[upper - 1];
  const high = table[upper];
  return low.volts + ((percent - low.percent) / (high.percent - low.percent)) * (high.volts - low.volts);
}

/** On the voltage chart: the voltage of the least charge a match may start with. */
export function voltageLines(settings: BatterySettings): TrendLine[] {
  const percent = settings.minimumStartChargePercent;
  return [{ value: Math.round(voltsAtPercent(percent, settings) * 100) / 100, label: `${percent} % charge`, tone: 'muted' }];
}

/** On the resistance chart: the battery's baseline and where its health turns to watch and replace. */
export function resistanceLines(health: HealthJson, settings: BatterySettings): TrendLine[] {
  const lines: TrendLine[] = [];
  const baseline = health.baselineMilliohm;
  if (baseline !== null) {
    const at = (percent: number) => Math.round(baseline * (1 + percent / 100) * 10) / 10;
    lines.push({ value: baseline, label: 'baseline', tone: 'muted', labelBelow: true });
    lines.push({ value: at(settings.watchIncreasePercent), label: `watch (+${settings.watchIncreasePercent} %)`, tone: 'warning' });
    lines.push({ value: at(settings.replaceIncreasePercent), label: `replace (+${settings.replaceIncreasePercent} %)`, tone: 'danger' });
  }
  if (settings.replaceAboveMilliohm !== null) lines.push({ value: settings.replaceAboveMilliohm, label: `replace (over ${settings.replaceAboveMilliohm} mΩ)`, tone: 'danger' });
  return lines;
}
