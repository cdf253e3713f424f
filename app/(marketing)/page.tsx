import Link from "next/link";
import { buttonLinkClass } from "@/components/ui/button";

const parts = [
  { title: "Short lessons", text: "Pipe and joining, sprinklers and coverage, freeze protection, hydraulics, testing, and how rough-in and trim fit between the other trades — 5 to 12 minutes each, with worked examples." },
  { title: "Quizzes graded on the server", text: "Question banks per module with numeric problems drawn fresh for every attempt. Pass the quiz and finish the lessons to complete a module." },
  { title: "Certificates anyone can check", text: "A PDF with continuing-education hours and a code that a builder, an inspector or a licensing body can verify online." },
  { title: "Code-reference cards", text: "One topic per card in plain words: what the requirement is for, what to check in the field, the mistakes crews make." },
  { title: "Field calculators", text: "K-factor flow and pressure, friction loss, elevation, flow-test supply against demand, stored water, room coverage — every step shown." },
  { title: "A board for training managers", text: "Assign modules with due dates, see who is behind, sign off practical skills with photo evidence, export proof of completion." },
];

export default function HomePage() {
  return (
    <div className="flex flex-col gap-10">
      <section className="grid gap-6 md:grid-cols-[3fr_2fr] md:items-center">
        <div>
          <p className="font-mono text-sm uppercase tracking-wide text-copper">Residential fire-sprinkler training</p>
          <h1 className="mt-2 text-4xl sm:text-5xl">Train the crew that protects the home.</h1>
          <p className="mt-4 max-w-prose text-lg">
            Riser teaches new installers, designers and builders&apos; sales staff the work of sprinkler systems in
            one- and two-family homes — and gives training managers the proof that each person is trained.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            <Link href="/sign-in" className={buttonLinkClass}>Sign in</Link>
            <Link href="/sign-up" className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 py-2 font-bold text-ink no-underline">Set up your company</Link>
          </div>
        </div>
        <HeroDiagram />
      </section>
      <section aria-labelledby="what-heading">
        <h2 id="what-heading" className="text-2xl">What Riser gives you</h2>
        <ul className="mt-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {parts.map((p) => (
            <li key={p.title} className="rounded border border-line bg-panel p-4">
              <h3 className="text-lg">{p.title}</h3>
              <p className="mt-2 text-muted">{p.text}</p>
            </li>
          ))}
        </ul>
      </section>
      <section className="rounded border-l-4 border-caution bg-caution-light p-4" aria-label="Safety note">
        <p>
          <strong>Riser is a training and checking aid.</strong> The sprinkler&apos;s listing, the code your jurisdiction
          adopted with its local amendments, and the authority having jurisdiction decide every installation.
        </p>
      </section>
    </div>
  );
}

function HeroDiagram() {
  return (
    <svg viewBox="0 0 320 220" role="img" aria-label="A house cross-section with a water service, a riser and two sprinklers spraying in one room" className="w-full max-w-md">
      <rect className="fill-panel" x="0" y="0" width="320" height="220" />
      <path className="stroke-ink" d="M40 90 L160 30 L280 90" fill="none" strokeWidth="4" />
      <rect className="stroke-ink" x="50" y="90" width="220" height="110" fill="none" strokeWidth="4" />
      <line className="stroke-ink" x1="50" y1="150" x2="270" y2="150" strokeWidth="2" />
      <line className="stroke-water" x1="0" y1="212" x2="90" y2="212" strokeWidth="6" />
      <line className="stroke-copper-bright" x1="88" y1="212" x2="88" y2="100" strokeWidth="6" />
      <line className="stroke-copper-bright" x1="88" y1="102" x2="250" y2="102" strokeWidth="4" />
      <line className="stroke-copper-bright" x1="88" y1="158" x2="250" y2="158" strokeWidth="4" />
      {[140, 220].map((x) => (
        <g key={x}>
          <line className="stroke-copper-bright" x1={x} y1="158" x2={x} y2="166" strokeWidth="4" />
          <path className="stroke-ink" d={`M${x - 8} 168 L${x + 8} 168`} strokeWidth="3" />
        </g>
      ))}
      <path className="stroke-water" d="M132 170 Q140 190 120 200 M148 170 Q140 190 160 200 M212 170 Q220 190 200 200 M228 170 Q220 190 240 200" fill="none" strokeWidth="2" strokeDasharray="4 3" />
      <circle className="stroke-ink" cx="100" cy="190" r="6" fill="none" strokeWidth="2" />
      <text className="fill-ink" x="8" y="206" fontSize="11">water service</text>
      <text className="fill-ink" x="96" y="125" fontSize="11">riser</text>
    </svg>
  );
}
