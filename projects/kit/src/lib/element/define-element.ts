import { EnvironmentProviders, Provider, Type, provideZonelessChangeDetection } from '@angular/core';
import { createCustomElement } from '@angular/elements';
import { createApplication } from '@angular/platform-browser';
import { MODULE_BASE_PATH } from './shell-link';

/**
 * Boots a zoneless Angular application and registers `component` as the custom element `tag`.
 * Registering twice (the bundle loaded twice) is a no-op, never an error.
 */
export async function defineTubwrightElement(
  tag: string,
  component: Type<unknown>,
  providers: Array<Provider | EnvironmentProviders> = [],
): Promise<void> {
  if (customElements.get(tag)) return;
  // `<tw-orders>` lives at /orders in the console: its links get real hrefs there.
  const base: Provider = { provide: MODULE_BASE_PATH, useValue: `/${tag.replace(/^tw-/, '')}` };
  const app = await createApplication({ providers: [provideZonelessChangeDetection(), base, ...providers] });
  if (customElements.get(tag)) return;
  customElements.define(tag, createCustomElement(component, { injector: app.injector }));
}
