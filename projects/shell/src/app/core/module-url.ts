import { AreaName, ModuleName, isAreaName } from './areas';

/**
 * `/collection/animals/42?q=x` → { area: 'collection', subPath: 'animals/42?q=x' }.
 * The sub-path is what a module element receives in its `path` attribute.
 */
export function splitConsoleUrl(url: string): { area: AreaName | null; first: string; subPath: string } {
  const hashless = url.split('#')[0];
  const queryAt = hashless.indexOf('?');
  const pathname = queryAt < 0 ? hashless : hashless.slice(0, queryAt);
  const search = queryAt < 0 ? '' : hashless.slice(queryAt);
  const [first = '', ...rest] = pathname.replace(/^\/+/, '').split('/');
  return { area: isAreaName(first) ? first : null, first, subPath: rest.join('/').replace(/\/+$/, '') + search };
}

/** The console URL for a module's sub-path, as an element asks for it in `tw-navigate`. */
export function moduleUrl(module: ModuleName, subPath: string): string {
  const clean = subPath.trim().replace(/^\/+/, '');
  if (!clean) return `/${module}`;
  return clean.startsWith('?') ? `/${module}${clean}` : `/${module}/${clean}`;
}

/** Only same-console paths are followed after sign-in (no `//evil.example`). */
export function safeReturnUrl(value: string | null | undefined): string | null {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return null;
  if (value.startsWith('/sign-in')) return null;
  return value;
}
