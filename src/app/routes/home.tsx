import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { MyWork } from '@/features/builds/components/home/my-work.tsx';
import { UnreadSummary } from '@/features/notifications/components/unread-summary.tsx';

const areas = [
  {
    to: paths.builds,
    title: 'Builds',
    text: 'Build logs of tunnelling and force microscopes, profilometers and stages: write-ups, photos, actuators and their calibration runs.',
  },
  {
    to: paths.parts,
    title: 'Parts registry',
    text: 'Salvaged bimorphs, buzzer discs, stacks and tubes with pooled, moderator-checked gains in nm/V.',
  },
  { to: paths.exchange, title: 'Exchange', text: 'Offer spare transducers or ask for the part your build needs.' },
  {
    to: paths.workbench,
    title: 'Workbench',
    text: 'Gain fits with uncertainty, expected gain from geometry, two-axis mixing, scan planning, resonance and drive current.',
  },
];

export function HomePage() {
  const { data } = useSession();
  return (
    <div className="space-y-10">
      <section className="grid gap-6 md:grid-cols-[3fr_2fr] md:items-center">
        <div>
          <h1 className="text-3xl font-semibold tracking-tight md:text-4xl">Measure it once, share it with every builder.</h1>
          <p className="mt-3 text-lg text-ink-soft">
            Scanwright collects what home-built scanning probe instruments run on: measured actuator gains, hysteresis and build notes for
            repurposed piezo parts that never came with a datasheet.
          </p>
          {data && !data.user && (
            <p className="mt-5">
              <a
                href={paths.signIn('/')}
                className="inline-flex rounded-md bg-copper px-4 py-2 font-medium text-white hover:bg-copper-dark"
              >
                Sign in to publish a build
              </a>
            </p>
          )}
          {data?.user && (
            <p className="mt-5 text-ink-soft">
              Signed in as <span className="font-medium text-ink">{data.user.login}</span>.
            </p>
          )}
          {data?.user && (
            <div className="mt-3">
              <UnreadSummary />
            </div>
          )}
        </div>
        <figure className="rounded-lg border border-rule bg-white p-4" aria-label="Example: displacement against drive voltage">
          <svg
            viewBox="0 0 240 140"
            className="w-full"
            role="img"
            aria-label="A calibration loop: displacement rises with voltage, the down sweep sits above the up sweep"
          >
            <line x1="30" y1="120" x2="230" y2="120" stroke="#1D232B" strokeWidth="1" />
            <line x1="30" y1="120" x2="30" y2="10" stroke="#1D232B" strokeWidth="1" />
            <path d="M30 120 C 90 110, 150 70, 220 18" fill="none" stroke="#B5532A" strokeWidth="2" />
            <path d="M220 18 C 160 50, 100 95, 30 120" fill="none" stroke="#2F6F73" strokeWidth="2" strokeDasharray="4 3" />
            <text x="130" y="136" fontSize="9" textAnchor="middle" fill="#4A525C">
              drive (V)
            </text>
            <text x="12" y="70" fontSize="9" textAnchor="middle" fill="#4A525C" transform="rotate(-90 12 70)">
              displacement (nm)
            </text>
          </svg>
          <figcaption className="mt-2 text-xs text-ink-soft">
            Up sweep (copper) and down sweep (teal): the gap between them is the hysteresis a calibration run reports.
          </figcaption>
        </figure>
      </section>
      {data?.user && <MyWork />}
      <section aria-labelledby="areas" className="grid gap-4 sm:grid-cols-2">
        <h2 id="areas" className="sr-only">
          Areas
        </h2>
        {areas.map((a) => (
          <Link key={a.to} to={a.to} className="rounded-lg border border-rule bg-white p-4 hover:border-copper">
            <h3 className="font-semibold">{a.title}</h3>
            <p className="mt-1 text-sm text-ink-soft">{a.text}</p>
          </Link>
        ))}
      </section>
      <p className="rounded-md border-l-4 border-amber bg-amber/10 p-3 text-sm">
        Piezo drivers run at tens to hundreds of volts and piezo elements hold charge. Follow local electrical codes and qualified practice.
      </p>
    </div>
  );
}
