import Link from "next/link";
import { Logo } from "@/components/logo";

const steps = [
  { title: "Calibrate the sheets", text: "Upload the architect's plan set, set each sheet's scale from a known dimension or a standard scale, and mark which unit type it shows." },
  { title: "Tag every window", text: "Keep the job's window list — sizes, wall depth, trim spec — and drop a tag on each opening. Counts add up per sheet, per unit type and for the job." },
  { title: "Get the trim package", text: "Casing, stool, apron and jamb extension for each window to the sixteenth, totals in linear feet, boards of purchasable length, priced with your own price book." },
  { title: "Build it", text: "The awarded takeoff becomes the material order and the installers' cut list, with the cautions a shop floor needs." },
];

export default function Landing() {
  return (
    <main className="mx-auto max-w-5xl px-6 py-10">
      <header className="flex items-center justify-between">
        <div className="flex items-center gap-2 text-lg font-bold text-spruce-800">
          <Logo /> Miterwise
        </div>
        <nav className="flex gap-2">
          <Link href="/sign-in" className="rounded-md px-3 py-2 text-sm font-semibold text-spruce-700 hover:bg-maple-100">
            Sign in
          </Link>
          <Link href="/sign-up" className="rounded-md bg-spruce-700 px-3 py-2 text-sm font-semibold text-maple-50 hover:bg-spruce-800">
            Create an account
          </Link>
        </nav>
      </header>

      <section className="mt-16 max-w-3xl">
        <p className="text-sm font-semibold uppercase tracking-wide text-brass-700">For finish-carpentry contractors</p>
        <h1 className="mt-2 text-4xl font-bold leading-tight text-graphite-900">
          From the architect&apos;s plan set to a priced window-trim bid — and a cut list your crew can trust.
        </h1>
        <p className="mt-4 text-lg text-graphite-700">
          Miterwise reads your plan PDFs with you: estimators calibrate sheets and tag openings, the takeoff engine works out
          every casing leg, stool, apron and jamb extension to the sixteenth, and the numbers become the bid, the material
          order and the installers&apos; cut list.
        </p>
      </section>

      <ol className="mt-12 grid gap-4 sm:grid-cols-2">
        {steps.map((s, i) => (
          <li key={s.title} className="rounded-lg border border-maple-200 bg-white p-5">
            <p className="text-sm font-semibold text-brass-700">Step {i + 1}</p>
            <h2 className="mt-1 font-semibold text-graphite-900">{s.title}</h2>
            <p className="mt-1 text-sm text-graphite-700">{s.text}</p>
          </li>
        ))}
      </ol>

      <footer className="mt-16 border-t border-maple-200 pt-4 text-xs text-graphite-600">
        Miterwise estimates material and labour; it does not certify code compliance. Follow local building codes and
        licensed practice.
      </footer>
    </main>
  );
}
