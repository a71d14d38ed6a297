import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { renderToStaticMarkup } from 'react-dom/server';
import { createElement, type ReactElement } from 'react';
import type { NextConfig } from 'next';
// @ts-expect-error the config is plain JavaScript (typed by JSDoc only), so it has no declaration file
import rawConfig from '@/next.config.mjs';
import UsersPage from '@/app/(app)/admin/users/page';
import UsersForbidden from '@/app/(app)/admin/users/forbidden';
import NewScenePage from '@/app/(app)/scenes/new/page';
import NewSceneForbidden from '@/app/(app)/scenes/new/forbidden';
import NewProfilePage from '@/app/(app)/equipment/new/page';
import NewProfileForbidden from '@/app/(app)/equipment/new/forbidden';
import NewRiggingPage from '@/app/(app)/rigging/new/page';
import NewRiggingForbidden from '@/app/(app)/rigging/new/forbidden';
import ReviewQueuePage from '@/app/(app)/review/page';
import ReviewQueueForbidden from '@/app/(app)/review/forbidden';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';

const nextConfig = rawConfig as NextConfig;

// What `next build` sets from experimental.authInterrupts; forbidden() refuses to run without it.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';

/** The digest Next gives forbidden()'s interrupt; its renderer answers 403 and shows the nearest forbidden.tsx. */
const FORBIDDEN_DIGEST = 'NEXT_HTTP_ERROR_FALLBACK;403';

async function interruptOf(render: () => Promise<unknown>): Promise<string | null> {
  try {
    await render();
    return null;
  } catch (e) {
    return (e as { digest?: string }).digest ?? String(e);
  }
}

const html = async (el: ReactElement) => {
  // forbidden.tsx renders an async server component: resolve it the way the server renderer would.
  const inner = el.type as (p: unknown) => ReactElement;
  const child = inner(el.props) as ReactElement;
  const resolved = await (child.type as (p: unknown) => Promise<ReactElement>)(child.props);
  return renderToStaticMarkup(resolved);
};

beforeAll(async () => {
  await freshSeededDb();
});

describe('pages a role may not see answer through forbidden()', () => {
  it('the app turns authInterrupts on', () => {
    expect(nextConfig.experimental?.authInterrupts).toBe(true);
  });

  const cases = [
    { name: '/admin/users', page: UsersPage, boundary: UsersForbidden, refused: 'operator@harrow.example', allowed: 'admin@harrow.example', heading: 'This page is for administrators' },
    { name: '/scenes/new', page: NewScenePage, boundary: NewSceneForbidden, refused: 'supervisor@harrow.example', allowed: 'operator@harrow.example', heading: 'This page is for operators' },
    { name: '/equipment/new', page: NewProfilePage, boundary: NewProfileForbidden, refused: 'operator@harrow.example', allowed: 'admin@harrow.example', heading: 'This page is for admins, who manage truck profiles' },
    { name: '/rigging/new', page: NewRiggingPage, boundary: NewRiggingForbidden, refused: 'trainer@harrow.example', allowed: 'operator@harrow.example', heading: 'This page is for operators and admins, who manage rigging' },
    { name: '/review', page: ReviewQueuePage, boundary: ReviewQueueForbidden, refused: 'operator@harrow.example', allowed: 'supervisor@harrow.example', heading: 'This page is for supervisors and administrators' },
  ] as const;

  for (const c of cases) {
    it(`${c.name}: 403 interrupt for the wrong role, the page for the right one`, async () => {
      signInAs(await demoUser(c.refused));
      // Pages that read the query get an empty one; the others ignore it.
      const props = { searchParams: Promise.resolve({}) };
      expect(await interruptOf(() => (c.page as (p: unknown) => Promise<unknown>)(props))).toBe(FORBIDDEN_DIGEST);
      signInAs(await demoUser(c.allowed));
      expect(await interruptOf(() => (c.page as (p: unknown) => Promise<unknown>)(props))).toBeNull();
    });

    it(`${c.name}: the forbidden page says what is missing and who is signed in`, async () => {
      const user = await demoUser(c.refused);
      signInAs(user);
      const out = await html(createElement(c.boundary));
      expect(out).toContain('403 · Not available for your role');
      expect(out).toContain(c.heading);
      expect(out).toContain(user.name);
    });
  }
});
