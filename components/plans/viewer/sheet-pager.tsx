import Link from "next/link";
import { ChevronLeft, ChevronRight } from "lucide-react";
import type { SheetView } from "@/lib/plans/api-types";

interface Props {
  plansHref: string;
  sheetHref: (sheetId: string) => string;
  previous: SheetView | null;
  next: SheetView | null;
  position: number | null;
  of: number;
}

const LINK = "inline-flex h-7 items-center gap-0.5 rounded-md border border-graphite-400 bg-white px-1.5 text-xs font-medium text-graphite-900 hover:bg-maple-100";

/** Back to the list, and on to the sheets either side in sheet-number order (the Plans page's order). */
export function SheetPager({ plansHref, sheetHref, previous, next, position, of }: Props) {
  return (
    <nav aria-label="Sheets" className="flex items-center gap-1.5">
      <Link href={plansHref} className="text-xs text-spruce-700 underline">
        ← All sheets
      </Link>
      {previous && (
        <Link href={sheetHref(previous.id)} className={LINK} aria-label={`Previous sheet: ${previous.label}`} title={`Previous sheet: ${previous.label}`}>
          <ChevronLeft aria-hidden className="size-3.5" /> {previous.label}
        </Link>
      )}
      {position !== null && of > 1 && (
        <span className="num text-xs text-graphite-600">
          Sheet {position} of {of}
        </span>
      )}
      {next && (
        <Link href={sheetHref(next.id)} className={LINK} aria-label={`Next sheet: ${next.label}`} title={`Next sheet: ${next.label}`}>
          {next.label} <ChevronRight aria-hidden className="size-3.5" />
        </Link>
      )}
    </nav>
  );
}
