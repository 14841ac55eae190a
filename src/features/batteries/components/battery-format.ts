import type { BatteryStatus, Chemistry, HealthStatus } from '@shared/domain/battery-state';

// Numbers as read across a pit: whole percent, volts to the hundredth (what analyzers show),
// milliohms to a tenth at most.

export const formatPercent = (percent: number) => `${Math.round(percent)} %`;

export const formatVolts = (volts: number) => `${volts.toFixed(2)} V`;

export const formatMilliohm = (milliohm: number) => `${Math.round(milliohm * 10) / 10} mΩ`;

/** "+12.5 %", "−3 %": the rise of resistance over the baseline. */
export const formatIncrease = (percent: number) => `${percent < 0 ? '−' : '+'}${Math.abs(Math.round(percent * 10) / 10)} %`;

export const STATUS_WORDS: Record<BatteryStatus, string> = {
  ready: 'Ready',
  charging: 'Charging',
  in_robot: 'In the robot',
  spent: 'Spent',
  resting: 'Resting',
  retired: 'Retired',
};

export const HEALTH_WORDS: Record<HealthStatus, string> = { good: 'Good', watch: 'Watch', replace: 'Replace' };

export const CHEMISTRY_WORDS: Record<Chemistry, string> = { sealed_agm: 'Sealed AGM', gel: 'Gel', flooded: 'Flooded' };
