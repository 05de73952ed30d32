import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { EnvironmentProviders, Provider, makeEnvironmentProviders } from '@angular/core';
import { MAT_ICON_DEFAULT_OPTIONS } from '@angular/material/icon';
import { authInterceptor } from './api/auth-interceptor';

/** Icons are ligatures of the self-hosted Material Symbols font. */
export function provideTubwrightIcons(): Provider {
  return { provide: MAT_ICON_DEFAULT_OPTIONS, useValue: { fontSet: 'material-symbols-outlined' } };
}

/** What the shell and every module element need: the API client with its bearer token, and icons. */
export function provideTubwrightKit(): EnvironmentProviders {
  return makeEnvironmentProviders([provideHttpClient(withInterceptors([authInterceptor])), provideTubwrightIcons()]);
}
