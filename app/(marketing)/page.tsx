import type { Metadata } from 'next';
import { ButtonLink } from '@/components/ui/button';
import { Wordmark } from '@/components/logo';
import { PlanSketch } from '@/components/marketing/plan-sketch';
import { CautionNote } from '@/components/caution-note';
import { getCurrentUser } from '@/lib/auth/current-user';

export const metadata: Metadata = { title: 'Lift planning sketches for rotator crews' };

const STEPS = [
  {
    n: '01',
    title: 'Sketch the scene to scale',
    body: 'Place the truck, set each outrigger leg and its cribbing, mark the load, the trailer, obstacles and overhead lines on a plan of the site.',
  },
  {
    n: '02',
    title: 'Watch the numbers through the swing',
    body: 'Tipping margin, pad loads against ground bearing pressure, and clearance to the tailboard, cab and lines, computed at every slew angle from pick to set.',
  },
  {
    n: '03',
    title: 'Send it up for review',
    body: 'Save revisions, let a supervisor review the plan from the office, and keep worked scenes for training nights.',
  },
];

export default async function LandingPage() {
  const user = await getCurrentUser();
  const cta = user ? { href: '/scenes', label: 'Open your scenes' } : { href: '/sign-in', label: 'Sign in' };
  return (
    <div className="survey-grid min-h-screen">
      <header className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-6 py-5">
        <Wordmark />
        <ButtonLink href={cta.href} variant="primary">
          {cta.label}
        </ButtonLink>
      </header>

      <main className="mx-auto max-w-6xl px-6 pb-16">
        <section className="grid items-center gap-10 py-8 lg:grid-cols-[1.1fr_1fr] lg:py-14">
          <div>
            <p className="mb-3 inline-block rounded-sm bg-ink px-2 py-0.5 text-caption font-bold uppercase tracking-[0.16em] text-signal">
              For heavy recovery crews
            </p>
            <h1 className="text-display text-ink">Plan the lift before the first leg goes down.</h1>
            <p className="mt-5 max-w-xl text-lead text-ink-soft">
              Arcline is a to-scale plan sketch for rotator wreckers. Put the truck, the pads and the load where they will be, and see the stability and
              ground margins at every angle of the swing — then save it, have it reviewed, and replay it later.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <ButtonLink href={cta.href} variant="signal" size="lg">
                {cta.label} →
              </ButtonLink>
            </div>
          </div>
          <div className="rounded-[14px] border-2 border-ink bg-paper-raised p-2 shadow-lift">
            <PlanSketch className="h-auto w-full" />
          </div>
        </section>

        <section aria-labelledby="how" className="border-t-2 border-ink pt-8">
          <h2 id="how" className="text-heading text-ink">
            How a plan comes together
          </h2>
          <ol className="mt-5 grid gap-5 md:grid-cols-3">
            {STEPS.map((s) => (
              <li key={s.n} className="rounded-plate border border-paper-line bg-paper-raised p-5 shadow-plate">
                <span className="text-caption font-extrabold tracking-[0.2em] text-teal">{s.n}</span>
                <h3 className="mt-1 text-lead font-bold text-ink">{s.title}</h3>
                <p className="mt-2 text-body text-ink-soft">{s.body}</p>
              </li>
            ))}
          </ol>
        </section>

        <CautionNote className="mt-10" />
      </main>
    </div>
  );
}
