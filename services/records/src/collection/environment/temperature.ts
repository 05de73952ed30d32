/*
 * Exact conversions of NIST SP 811 (2008), Appendix B: t/°C = (t/°F − 32)/1.8 and back. No
 * rounding here; callers round for display.
 */
export const fahrenheitToCelsius = (tempF: number): number => (tempF - 32) / 1.8;
export const celsiusToFahrenheit = (tempC: number): number => tempC * 1.8 + 32;

/** For display: hundredths of a degree, without binary noise such as 31.110000000000003. */
export const roundTo = (value: number, decimals: number): number => Number(value.toFixed(decimals));
