import { CALIBRATION_CAUTION } from '../../../../../shared/api/collection-environment.js';

/*
 * Ranges, common practice for the ball python (the shop's main species; the same defaults serve
 * until the species list carries its own): warm side 88 to 92 °F, cool side 76 to 80 °F, humidity
 * 50 to 60 %. Room air (ambient probe) is checked for humidity only.
 */
export const RANGES = {
  warmF: [88, 92] as [number, number],
  coolF: [76, 80] as [number, number],
  humidityPct: [50, 60] as [number, number],
  caution: CALIBRATION_CAUTION,
};

export type Probe = 'warm' | 'cool' | 'ambient';

export function readingAlerts(reading: { probe: Probe; tempF: number | null; humidityPct: number | null }): string[] {
  const alerts: string[] = [];
  const range = reading.probe === 'warm' ? RANGES.warmF : reading.probe === 'cool' ? RANGES.coolF : null;
  if (range && reading.tempF !== null) {
    if (reading.tempF < range[0]) alerts.push(`${reading.probe} side ${reading.tempF} °F is below ${range[0]} °F`);
    if (reading.tempF > range[1]) alerts.push(`${reading.probe} side ${reading.tempF} °F is above ${range[1]} °F`);
  }
  const [low, high] = RANGES.humidityPct;
  if (reading.humidityPct !== null) {
    if (reading.humidityPct < low) alerts.push(`humidity ${reading.humidityPct} % is below ${low} %`);
    if (reading.humidityPct > high) alerts.push(`humidity ${reading.humidityPct} % is above ${high} %`);
  }
  return alerts;
}
