import { DOCUMENT } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { ElementLoader } from './element-loader';

describe('ElementLoader', () => {
  let loader: ElementLoader;
  let doc: Document;
  const scripts = (module: string) => doc.head.querySelectorAll(`script[data-tw-module="${module}"]`);

  beforeEach(() => {
    loader = TestBed.inject(ElementLoader);
    doc = TestBed.inject(DOCUMENT);
  });

  it('loads nothing until a module is asked for', () => {
    expect(doc.head.querySelectorAll('script[data-tw-module]').length).toBe(0);
  });

  it('injects one module script per module, however often it is asked for', async () => {
    const first = loader.load('orders');
    const second = loader.load('orders');
    expect(scripts('orders').length).toBe(1);
    const script = scripts('orders')[0] as HTMLScriptElement;
    expect(script.type).toBe('module');
    expect(script.getAttribute('src')).toBe('/elements/orders/main.js');

    // What the bundle does when it runs.
    customElements.define('tw-orders', class extends HTMLElement {});
    await Promise.all([first, second]);
    await loader.load('orders');
    expect(scripts('orders').length).toBe(1);
  });

  it('allows a retry after the script failed to load', async () => {
    const failed = loader.load('planning');
    scripts('planning')[0].dispatchEvent(new Event('error'));
    await expect(failed).rejects.toThrow(/could not be loaded/);
    expect(scripts('planning').length).toBe(0);

    void loader.load('planning');
    expect(scripts('planning').length).toBe(1);
  });
});
