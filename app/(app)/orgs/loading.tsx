import { Logo } from "@/components/logo";
import { LoadingState } from "@/components/shell/page-state";

// Right after sign-in this page picks the organisation and moves on: show the mark and a word, not a blank page.
// (Only here and on the sheet: a loading boundary above a page that may answer 404 would turn that into a 200.)
export default function OrgsLoading() {
  return (
    <main className="mx-auto flex max-w-lg flex-col items-center px-6 py-24">
      <Logo className="h-10 w-10" />
      <LoadingState label="Opening your workspace…" />
    </main>
  );
}
