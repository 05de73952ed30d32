/** °F → °C as NIST SP 811 gives it, (°F − 32) / 1.8, to one decimal for display. */
export function toCelsius(tempF: number): number {
  return Math.round(((tempF - 32) / 1.8) * 10) / 10;
}
