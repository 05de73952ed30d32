import { Pipe, PipeTransform } from '@angular/core';

const formats = new Map<string, Intl.NumberFormat>();

/** Integer cents as money in the record's currency: 148000, 'usd' → `$1,480.00`. */
export function formatCents(cents: number | null | undefined, currency = 'usd'): string {
  if (cents === null || cents === undefined || !Number.isFinite(cents)) return '—';
  const code = currency.toUpperCase();
  let format = formats.get(code);
  if (!format) {
    try {
      format = new Intl.NumberFormat('en-US', { style: 'currency', currency: code });
    } catch {
      // An unknown code still shows the amount.
      format = new Intl.NumberFormat('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
    }
    formats.set(code, format);
  }
  return format.format(cents / 100);
}

/** `12.5` or `12.50` or `$12.50` typed by a person → 1250 cents; null when it is not an amount. */
export function parseMoneyToCents(text: string): number | null {
  const cleaned = text.replace(/[$,\s]/g, '');
  if (!/^\d+(\.\d{1,2})?$/.test(cleaned)) return null;
  // Whole and fraction apart: no binary fraction ever reaches the cents.
  const [whole, fraction = ''] = cleaned.split('.');
  return Number(whole) * 100 + Number(fraction.padEnd(2, '0'));
}

/** Cents as a plain amount for an input field: 4500 → `45.00`. */
export function centsToInput(cents: number): string {
  return (cents / 100).toFixed(2);
}

/** A price-list amount (currency units with decimals) in whole cents. */
export function unitsToCents(amount: number): number {
  return Math.round(amount * 100);
}

@Pipe({ name: 'money' })
export class MoneyPipe implements PipeTransform {
  transform(cents: number | null | undefined, currency = 'usd'): string {
    return formatCents(cents, currency);
  }
}
