import { DOCUMENT, Injectable, inject } from '@angular/core';
import { ModuleName } from './areas';

export const elementTag = (module: ModuleName): string => `tw-${module}`;
export const elementScriptUrl = (module: ModuleName): string => `/elements/${module}/main.js`;

/** Loads a module's element bundle on its first visit; later visits reuse the defined element. */
@Injectable({ providedIn: 'root' })
export class ElementLoader {
  private readonly document = inject(DOCUMENT);
  private readonly loads = new Map<ModuleName, Promise<void>>();

  load(module: ModuleName): Promise<void> {
    let loading = this.loads.get(module);
    if (!loading) {
      loading = this.inject(module);
      this.loads.set(module, loading);
      // A failed load (offline, deploy in progress) may be retried later.
      loading.catch(() => this.loads.delete(module));
    }
    return loading;
  }

  private inject(module: ModuleName): Promise<void> {
    const tag = elementTag(module);
    const registry = this.document.defaultView?.customElements ?? customElements;
    if (registry.get(tag)) return Promise.resolve();
    return new Promise<void>((resolve, reject) => {
      const script = this.document.createElement('script');
      script.type = 'module';
      script.src = elementScriptUrl(module);
      script.dataset['twModule'] = module;
      script.onerror = () => {
        script.remove();
        reject(new Error(`The ${module} module could not be loaded. Check the connection and try again.`));
      };
      this.document.head.appendChild(script);
      registry.whenDefined(tag).then(() => resolve(), reject);
    });
  }
}
