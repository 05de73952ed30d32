import { EnvironmentProviders, Provider, Type, provideZonelessChangeDetection } from '@angular/core';
import { createCustomElement } from '@angular/elements';
import { createApplication } from '@angular/platform-browser';

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
  const app = await createApplication({ providers: [provideZonelessChangeDetection(), ...providers] });
  if (customElements.get(tag)) return;
  customElements.define(tag, createCustomElement(component, { injector: app.injector }));
}
