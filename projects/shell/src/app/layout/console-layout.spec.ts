import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { AuthSession, Role, provideTubwrightIcons } from '@tubwright/kit';
import { ConsoleLayout } from './console-layout';

async function renderAs(role: Role) {
  TestBed.configureTestingModule({
    providers: [provideRouter([]), provideHttpClient(), provideTubwrightIcons()],
  });
  TestBed.inject(AuthSession).set({
    accessToken: 'a',
    refreshToken: 'r',
    expiresIn: 900,
    user: { id: 7, email: `${role}@example.test`, name: `Demo ${role}`, role },
  });
  const fixture = TestBed.createComponent(ConsoleLayout);
  await fixture.whenStable();
  const element: HTMLElement = fixture.nativeElement;
  const links = Array.from(element.querySelectorAll<HTMLAnchorElement>('nav[aria-label="Modules"] a'));
  return { element, links: links.map((a) => [a.querySelector('span')?.textContent?.trim(), a.getAttribute('href')]) };
}

describe('ConsoleLayout navigation', () => {
  beforeEach(() => localStorage.clear());

  it('shows a keeper the collection only', async () => {
    const { links } = await renderAs('keeper');
    expect(links).toEqual([['Collection', '/collection']]);
  });

  it('shows sales orders and planning', async () => {
    const { links } = await renderAs('sales');
    expect(links.map(([, href]) => href)).toEqual(['/orders', '/planning']);
  });

  it('shows the owner every module plus users, API keys, activity and outbox', async () => {
    const { links } = await renderAs('owner');
    expect(links.map(([, href]) => href)).toEqual(['/planning', '/collection', '/orders', '/users', '/api-keys', '/activity', '/outbox']);
  });

  it('names the account in the user menu button', async () => {
    const { element } = await renderAs('builder');
    expect(element.querySelector('button.avatar')?.getAttribute('aria-label')).toBe('Account of builder@example.test');
  });
});
