import { Logo } from "@/components/logo";
import { LoadingState } from "@/components/shell/page-state";

// Right after sign-in the organisation's layout is still being read: show the mark and a word, not a blank page.
export default function AppLoading() {
  return (
    <main className="mx-auto flex max-w-lg flex-col items-center px-6 py-24">
      <Logo className="h-10 w-10" />
      <LoadingState label="Opening your workspace…" />
    </main>
  );
}
