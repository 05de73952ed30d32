import { provideZonelessChangeDetection } from '@angular/core';
import { createCustomElement } from '@angular/elements';
import { createApplication } from '@angular/platform-browser';
import { RackSizer } from './app/rack-sizer';
import { WIDGET_API_ORIGIN } from './app/widget-api';

const TAG = 'tw-rack-sizer';

/**
 * The widget script a shop pastes into its site. It calls the API on the origin it was loaded
 * from, so `<script type="module" src="https://shop.example/widget/tw-rack-sizer.js">` works on
 * any page. Zoneless and without the kit's HttpClient set-up: small, and harmless to other
 * frameworks on the page. Loading the script twice defines the element once.
 */
async function defineWidget(): Promise<void> {
  if (customElements.get(TAG)) return;
  const app = await createApplication({
    providers: [provideZonelessChangeDetection(), { provide: WIDGET_API_ORIGIN, useValue: new URL(import.meta.url).origin }],
  });
  if (!customElements.get(TAG)) customElements.define(TAG, createCustomElement(RackSizer, { injector: app.injector }));
}

defineWidget().catch((error: unknown) => console.error(`${TAG} could not start`, error));
