import type { Injector } from '@angular/core';
import { Observable, from, switchMap } from 'rxjs';
import type { Clutch } from '../core/collection-types';
import type { HatchDialogResult } from './hatch-dialog';

/**
 * Opens the hatch dialog for a clutch; emits once it closes (with the hatch, if one was recorded).
 * The dialog, its forms and Material's dialog load on first use, keeping them out of the element's first bundle.
 */
export function openHatchDialog(injector: Injector, clutch: Clutch, pairingLabel: string): Observable<HatchDialogResult | undefined> {
  return from(import('./hatch-dialog')).pipe(switchMap((m) => m.showHatchDialog(injector, clutch, pairingLabel)));
}
