import { Link } from "react-router-dom";
import { useSession } from "../../../lib/session";

/** The order an engineer thinks in, which is also the order of the bench. */
const steps = [
  {
    mark: "σ",
    title: "The state you have",
    text: "Type, paste or import a stress tensor from a hand calculation, a finite-element point or a strain-gauge rosette, in the unit you work in.",
  },
  {
    mark: "R",
    title: "The element you turn",
    text: "Rotate the element onto the plane that matters — a weld throat, a fibre direction, a crack plane — and read the components in that frame.",
  },
  {
    mark: "○",
    title: "The diagram that explains it",
    text: "Mohr's circles with the faces of the turned element marked on them, principal stresses and maximum shear labelled in your unit.",
  },
  {
    mark: "n",
    title: "The verdict that matters",
    text: "Von Mises and Tresca for ductile metals; maximum principal, Mohr–Coulomb and modified Mohr for brittle ones; a safety factor against the allowable you name.",
  },
];

const record = [
  ["Load cases", "Operating, design, test and upset states side by side, with the one that governs named."],
  [
    "Team workspaces",
    "Owners, editors, reviewers and viewers; share links that bring a colleague to the exact page.",
  ],
  [
    "Calculation record",
    "Inputs, results and sources kept together, so a checker can review, approve and reopen the work later.",
  ],
];

/** The landing page: what Sigmacube is for and how a check reads in it. */
export function HomePage() {
  return (
    <div className="space-y-12">
      <section className="grid items-center gap-10 md:grid-cols-[1.15fr_1fr]">
        <div>
          <p className="text-sm font-semibold uppercase tracking-[0.14em] text-ink">Stress-state checking</p>
          <h1 className="mt-3 text-4xl leading-tight font-semibold tracking-tight text-graphite md:text-[2.75rem]">
            A calculation sheet that computes, explains and keeps the record.
          </h1>
          <p className="mt-5 max-w-xl text-lg text-graphite-soft">
            Sigmacube is for the engineers who find principal stresses, resolve them onto the planes that
            matter and check them against the right yield or fracture criterion — and for the checkers who
            sign that work off.
          </p>
          <StartLinks />
        </div>
        <PrincipalSketch />
      </section>

      <section aria-labelledby="how-heading">
        <h2 id="how-heading" className="border-b border-rule pb-2 text-lg font-semibold">
          How a check reads
        </h2>
        <ol className="mt-5 grid gap-px overflow-hidden rounded border border-rule bg-rule sm:grid-cols-2 lg:grid-cols-4">
          {steps.map((step, index) => (
            <li key={step.title} className="bg-panel p-5">
              <div className="flex items-baseline gap-3">
                <span className="num text-sm text-graphite-faint">{String(index + 1).padStart(2, "0")}</span>
                <span className="font-mono text-xl text-ink" aria-hidden="true">
                  {step.mark}
                </span>
              </div>
              <h3 className="mt-2 font-semibold">{step.title}</h3>
              <p className="mt-1.5 text-[15px] leading-relaxed text-graphite-soft">{step.text}</p>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="record-heading" className="grid gap-8 md:grid-cols-[1fr_2fr]">
        <h2 id="record-heading" className="text-lg font-semibold">
          Every load case, every location, one record
        </h2>
        <dl className="divide-y divide-rule border-y border-rule">
          {record.map(([term, description]) => (
            <div key={term} className="grid gap-1 py-3 sm:grid-cols-[12rem_1fr]">
              <dt className="font-semibold">{term}</dt>
              <dd className="text-graphite-soft">{description}</dd>
            </div>
          ))}
        </dl>
      </section>
    </div>
  );
}

/** Where to go next: the bench and the workspaces when signed in, else sign-in or a new account. */
function StartLinks() {
  const session = useSession();
  const signedIn = Boolean(session.data?.user);
  const primary = "rounded bg-ink px-4 py-2 font-semibold text-panel hover:bg-ink-hover";
  const secondary =
    "rounded border border-rule-strong bg-panel px-4 py-2 font-semibold text-graphite hover:border-ink hover:text-ink";
  return (
    <div className="mt-7 flex flex-wrap gap-3">
      {signedIn ? (
        <>
          <Link to="/bench" className={primary}>
            Open the bench
          </Link>
          <Link to="/workspaces" className={secondary}>
            Your workspaces
          </Link>
        </>
      ) : (
        <>
          <Link to="/sign-up" className={primary}>
            Create an account
          </Link>
          <Link to="/sign-in?next=%2Fbench" className={secondary}>
            Sign in to the bench
          </Link>
        </>
      )}
    </div>
  );
}

/**
 * A labelled sketch of a stress element in its principal frame beside its Mohr circles.
 * Illustration only: no values are implied.
 */
function PrincipalSketch() {
  return (
    <figure className="rounded border border-rule bg-panel p-4">
      <svg
        viewBox="0 0 360 210"
        className="w-full bg-grid bg-[length:16px_16px]"
        role="img"
        aria-labelledby="sketch-title"
      >
        <title id="sketch-title">
          A stress element with its three principal stresses, and the three Mohr circles they define
        </title>
        <g className="stroke-ink" fill="none" strokeWidth={1.5} strokeLinejoin="round">
          <path d="M70 70 L110 50 L150 70 L110 90 Z" className="fill-ink-wash" />
          <path d="M70 70 L110 90 L110 140 L70 120 Z" className="fill-compression-wash" />
          <path d="M150 70 L110 90 L110 140 L150 120 Z" className="fill-tension-wash" />
        </g>
        <g fill="none" strokeWidth={2} strokeLinecap="round">
          <path d="M110 70 V22 M104 30 L110 21 L116 30" className="stroke-tension" />
          <path d="M130 112 L168 131 M158 133 L169 132 L164 122" className="stroke-tension" />
          {/* σ₃ is compressive: its arrow points into the face. */}
          <path d="M58 128 L88 113 M78 112 L89 112 L83 121" className="stroke-compression" />
        </g>
        <g className="fill-graphite font-mono" fontSize={12}>
          <text x="118" y="26">
            σ₁
          </text>
          <text x="168" y="146">
            σ₂
          </text>
          <text x="40" y="136">
            σ₃
          </text>
        </g>
        <g transform="translate(200 0)">
          <line x1="0" y1="110" x2="150" y2="110" className="stroke-graphite-faint" strokeWidth={1} />
          <line x1="20" y1="30" x2="20" y2="190" className="stroke-graphite-faint" strokeWidth={1} />
          <circle
            cx="82"
            cy="110"
            r="52"
            className="fill-ink-wash stroke-ink"
            strokeWidth={1.5}
            fillOpacity={0.6}
          />
          <circle cx="57" cy="110" r="27" className="fill-panel stroke-ink" strokeWidth={1.2} />
          <circle cx="109" cy="110" r="25" className="fill-panel stroke-ink" strokeWidth={1.2} />
          {/* The principal stresses are read off below the circles, on leader lines from the axis. */}
          <g className="stroke-graphite-faint" strokeWidth={0.8} strokeDasharray="2 2">
            <line x1="134" y1="110" x2="134" y2="170" />
            <line x1="84" y1="110" x2="84" y2="170" />
            <line x1="30" y1="110" x2="30" y2="170" />
          </g>
          <g className="fill-graphite font-mono" fontSize={11} textAnchor="middle">
            <text x="134" y="182">
              σ₁
            </text>
            <text x="84" y="182">
              σ₂
            </text>
            <text x="30" y="182">
              σ₃
            </text>
          </g>
          <g className="fill-graphite font-mono" fontSize={11}>
            <text x="145" y="104">
              σₙ
            </text>
            <text x="24" y="40">
              τ
            </text>
            <text x="60" y="52">
              τₘₐₓ
            </text>
          </g>
          <line
            x1="82"
            y1="58"
            x2="82"
            y2="110"
            className="stroke-graphite-soft"
            strokeDasharray="3 3"
            strokeWidth={1}
          />
        </g>
      </svg>
      <figcaption className="mt-2 text-sm text-graphite-soft">
        The element in its principal frame, and the three circles of Mohr those stresses define: every plane
        through the point lands in the shaded region.
      </figcaption>
    </figure>
  );
}
