import { BookOpen, FlaskConical, Gauge, MessageSquareText, Thermometer } from 'lucide-react';
import { Link } from 'react-router';
import { ButtonLink } from '@/components/ui/button-link';

const points = [
  { icon: BookOpen, title: 'Recipes with targets', text: 'Original and final gravity, volumes, boil-off, mash pH and temperatures: what every brew day is judged against.' },
  { icon: Gauge, title: 'Your own instruments', text: 'Each hydrometer, refractometer, thermometer and pH meter keeps its calibration, so every reading is corrected the same way.' },
  { icon: FlaskConical, title: 'A decision before the boil ends', text: 'Ten minutes from the end, one refractometer reading tells you how much extract or water to add, or how much longer to boil.' },
  { icon: Thermometer, title: 'Fermentation you can trust', text: 'Ready to package when two gravity readings days apart agree, never on the calendar alone.' },
  { icon: MessageSquareText, title: 'A mentor’s eye', text: 'Share a brew day with your club; a mentor sees where it left the recipe and why, and comments.' },
];

/** Demo sign-ins are only worth mentioning on a machine running the demo data, never on a real site. */
const onDevelopmentMachine = () => import.meta.env.DEV || ['127.0.0.1', 'localhost', '[::1]'].includes(window.location.hostname);

/** `/` for a visitor who is not signed in: what Wortwise does, with the public check one tap away. */
export function Component() {
  return (
    <div className="space-y-8">
      <section aria-labelledby="front-title" className="space-y-4">
        <h1 id="front-title" className="text-3xl font-bold text-cellar-900 sm:text-4xl">
          Brew to the numbers you planned
        </h1>
        <p className="max-w-2xl text-lg text-ink-soft">
          Wortwise keeps your recipes and their targets, logs every brew-day reading with your instruments’ own corrections, tells you what to do when the
          late-boil gravity is off, and follows fermentation until the beer is safe to package.
        </p>
        <div className="flex flex-wrap gap-2">
          <ButtonLink to="/late-boil-check">
            <FlaskConical aria-hidden className="size-5" /> Try the late-boil check
          </ButtonLink>
          <ButtonLink to="/sign-up" variant="secondary">
            Create an account
          </ButtonLink>
          <ButtonLink to="/sign-in" variant="quiet">
            Sign in
          </ButtonLink>
        </div>
        <p className="text-sm text-ink-soft">The late-boil check works without an account, in the browser, as you type.</p>
      </section>
      <section aria-labelledby="front-what" className="space-y-3">
        <h2 id="front-what" className="text-xl font-bold text-cellar-900">
          What it does
        </h2>
        <ul className="grid gap-3 sm:grid-cols-2">
          {points.map(({ icon: Icon, title, text }) => (
            <li key={title} className="flex gap-3 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
              <Icon aria-hidden className="mt-0.5 size-6 shrink-0 text-cellar-500" />
              <div>
                <h3 className="font-semibold text-cellar-900">{title}</h3>
                <p className="text-sm text-ink-soft">{text}</p>
              </div>
            </li>
          ))}
        </ul>
      </section>
      {onDevelopmentMachine() && (
        <section aria-labelledby="front-demo" className="rounded-xl bg-cellar-50 p-4 ring-1 ring-cellar-100">
          <h2 id="front-demo" className="font-semibold text-cellar-900">
            Demo accounts (this machine only)
          </h2>
          <p className="mt-1 text-sm text-ink-soft">
            The demo data is an invented club, the Hollow Oak Homebrew Circle. Sign in as <strong>priya@hollow-oak.example</strong> (a brewer) or{' '}
            <strong>ivo@hollow-oak.example</strong> (a mentor) with the password <strong>wortwise-demo</strong>; README.md lists the others.{' '}
            <Link to="/sign-in" className="font-semibold text-cellar-700 underline">
              Sign in
            </Link>
          </p>
        </section>
      )}
    </div>
  );
}
