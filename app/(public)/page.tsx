import Link from "next/link";
import { RedirectWhenSignedIn } from "@/components/shell/redirect-when-signed-in";
import { buttonClass } from "@/components/ui/button";

const JOBS = [
  {
    title: "Size it before you buy",
    body: "Bore, rod, pump stages and motor: force at the dies, ram speeds, motor power and every rating checked against the relief setting, each check with its source.",
  },
  {
    title: "Keep the as-built record",
    body: "What the press is made of, what was replaced and when. Hoses, filters, oil and welds logged with hours, cost and photos.",
  },
  {
    title: "Inspect at the press",
    body: "Checklists on a phone, pass or fail with notes and photos, signed by a competent person and sealed so the record cannot quietly change.",
  },
  {
    title: "Know before you book",
    body: "One status for every press — ready, service due, inspection overdue, tagged out — shown on the booking calendar and on a QR card at the machine.",
  },
];

export default function LandingPage() {
  return (
    <>
      <RedirectWhenSignedIn to="/dashboard" />
      <section className="bg-steel-900 text-white">
        <div className="mx-auto grid max-w-6xl gap-8 px-4 py-12 md:grid-cols-[1.3fr_1fr] md:items-center md:py-20">
          <div>
            <p className="mb-3 text-sm font-semibold uppercase tracking-widest text-oil-400">For builders of hydraulic forging presses</p>
            <h1 className="text-3xl font-semibold leading-tight tracking-tight sm:text-5xl">
              Build it right. Keep it safe. Know when it&apos;s ready.
            </h1>
            <p className="mt-5 max-w-xl text-base leading-relaxed text-steel-200 sm:text-lg">
              Presswright holds each press&apos;s as-built record, checks that its parts add up, says what service is due, keeps
              signed inspections and photo evidence, and tells a shop member at a glance whether a press is safe to use.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <Link href="/sign-up" className={buttonClass("primary")}>
                Create a free account
              </Link>
              <Link href="/sizing" className={buttonClass("secondary")}>
                Try the sizing calculator
              </Link>
            </div>
          </div>
          <PressDiagram />
        </div>
      </section>
      <section className="mx-auto grid max-w-6xl gap-4 px-4 py-10 sm:grid-cols-2 lg:grid-cols-4">
        {JOBS.map((job) => (
          <article key={job.title} className="rounded-lg bg-white p-5 shadow-sm ring-1 ring-steel-200">
            <h2 className="font-semibold text-ink">{job.title}</h2>
            <p className="mt-2 text-sm leading-relaxed text-steel-600">{job.body}</p>
          </article>
        ))}
      </section>
      <section className="mx-auto max-w-6xl px-4 pb-4">
        <p className="rounded-lg bg-warn-soft p-4 text-sm leading-relaxed text-warn ring-1 ring-warn/20">
          Pressurised oil can be injected through skin — a surgical emergency. Relieve stored pressure and lock out before
          any service, and search for leaks with cardboard, never a hand.
        </p>
      </section>
    </>
  );
}

/** A quiet line drawing of an H-frame press; purely decorative. */
function PressDiagram() {
  return (
    <svg viewBox="0 0 240 220" className="mx-auto w-full max-w-xs text-steel-300" role="img" aria-label="Outline of an H-frame press">
      <g fill="none" stroke="currentColor" strokeWidth="3" strokeLinejoin="round">
        <rect x="30" y="20" width="180" height="26" rx="3" />
        <rect x="42" y="46" width="16" height="150" />
        <rect x="182" y="46" width="16" height="150" />
        <rect x="30" y="168" width="180" height="22" rx="3" />
      </g>
      <rect x="104" y="46" width="32" height="52" fill="#cf8118" />
      <rect x="112" y="98" width="16" height="24" fill="#e39a32" />
      <rect x="92" y="122" width="56" height="12" rx="2" fill="#a9b6c1" />
      <rect x="100" y="154" width="40" height="14" rx="2" fill="#7d8e9c" />
    </svg>
  );
}
