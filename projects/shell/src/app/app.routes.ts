import { inject } from '@angular/core';
import { Route, Routes } from '@angular/router';
import { AuthSession } from '@tubwright/kit';
import { AREAS, ModuleName, homeFor } from './core/areas';
import { allowedFor, signedIn, signedOut } from './core/guards';
import { ConsoleLayout } from './layout/console-layout';
import { ModulePage } from './modules/module-page';
import { NotAvailable } from './not-available/not-available';

/** `/planning/**` and friends: every sub-path belongs to the module element. */
function moduleRoute(module: ModuleName): Route {
  return {
    path: module,
    canMatch: [allowedFor(module)],
    children: [{ path: '**', component: ModulePage, data: { module }, title: `${AREAS[module].label} · Tubwright` }],
  };
}

export const routes: Routes = [
  {
    path: 'sign-in',
    canMatch: [signedOut],
    title: 'Sign in · Tubwright',
    loadComponent: () => import('./sign-in/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'quote/:token',
    title: 'Your quote · Tubwright',
    loadComponent: () => import('./customer-quote/customer-quote').then((m) => m.CustomerQuotePage),
  },
  {
    path: 'reset-password',
    title: 'Reset password · Tubwright',
    loadComponent: () => import('./password-reset/password-reset').then((m) => m.PasswordReset),
  },
  {
    path: '',
    component: ConsoleLayout,
    canActivate: [signedIn],
    canActivateChild: [signedIn],
    children: [
      { path: '', pathMatch: 'full', redirectTo: () => homeFor(inject(AuthSession).role()) },
      moduleRoute('planning'),
      moduleRoute('collection'),
      moduleRoute('orders'),
      {
        path: 'users',
        canMatch: [allowedFor('users')],
        title: 'Users · Tubwright',
        loadComponent: () => import('./users/users-page').then((m) => m.UsersPage),
      },
      {
        path: 'api-keys',
        canMatch: [allowedFor('api-keys')],
        title: 'API keys · Tubwright',
        loadComponent: () => import('./api-keys/api-keys-page').then((m) => m.ApiKeysPage),
      },
      {
        path: 'activity',
        canMatch: [allowedFor('activity')],
        title: 'Activity · Tubwright',
        loadComponent: () => import('./activity/activity-list').then((m) => m.ActivityList),
      },
      {
        path: 'outbox',
        canMatch: [allowedFor('outbox')],
        children: [
          { path: '', title: 'Outbox · Tubwright', loadComponent: () => import('./outbox/outbox-list').then((m) => m.OutboxList) },
          { path: ':id', title: 'Message · Tubwright', loadComponent: () => import('./outbox/outbox-message').then((m) => m.OutboxMessage) },
        ],
      },
      { path: '**', title: 'Not available · Tubwright', component: NotAvailable },
    ],
  },
];
