"use client";

import dynamic from "next/dynamic";
import { useRef, useState } from "react";
import type { SheetView } from "@/lib/plans/api-types";
import { usePlanSetPdf } from "./plan-set-pdf";
import { useInView, useRenderSlot } from "./render-queue";

const PdfPage = dynamic(() => import("./pdf-page"), { ssr: false, loading: () => null });

/** Pictures already made this visit, so a re-render or refetch does not draw a page again. */
const pictures = new Map<string, string>();

const BOX = { width: 132, height: 96 };

/** The page's shape as displayed (a /Rotate of 90 or 270 turns it), fitted inside the thumbnail box. */
function fit(sheet: SheetView) {
  const turned = sheet.rotation % 180 !== 0;
  const aspect = turned ? sheet.height / sheet.width : sheet.width / sheet.height;
  const width = Math.round(Math.min(BOX.width, BOX.height * aspect));
  return { width, height: Math.round(width / aspect) };
}

/** A small picture of the sheet, drawn only once it scrolls near the screen. */
export function SheetThumbnail({ sheet }: { sheet: SheetView }) {
  const { pdf, state } = usePlanSetPdf();
  const { width, height } = fit(sheet);
  const key = `${sheet.planSetId}:${sheet.pageNumber}:${width}`;
  const [picture, setPicture] = useState(() => pictures.get(key) ?? null);
  const [failed, setFailed] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const near = useInView(box);
  const slot = useRenderSlot(near && !picture && !failed && pdf !== null);

  const status = state === "unavailable" || failed ? "No preview" : "Loading…";
  return (
    <div
      ref={box}
      style={{ width, height }}
      className="relative flex items-center justify-center overflow-hidden rounded border border-maple-300 bg-white"
    >
      {picture ? (
        // A blob: picture made in the browser: nothing for next/image to optimise.
        // eslint-disable-next-line @next/next/no-img-element
        <img src={picture} alt="" width={width} height={height} className="block" />
      ) : slot && pdf ? (
        <PdfPage
          pdf={pdf}
          pageNumber={sheet.pageNumber}
          width={width}
          onPicture={(url) => {
            pictures.set(key, url);
            setPicture(url);
          }}
          onFail={() => setFailed(true)}
        />
      ) : (
        <span className="px-1 text-center text-[0.65rem] text-graphite-600">{status}</span>
      )}
    </div>
  );
}
