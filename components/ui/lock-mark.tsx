import { Lock } from "lucide-react";

/**
 * The padlock beside a submitted (locked) takeoff: an inline SVG shipped with the app, so it shows on machines
 * without an emoji font, where the emoji drew an empty box. Always next to words: the icon alone means nothing.
 */
export function LockMark() {
  return <Lock aria-hidden focusable="false" className="inline size-[1em] shrink-0 align-[-0.125em]" strokeWidth={2.25} />;
}
