/** A key hint. Hidden below 1280 px wide, where the toolbar needs the room (the ? panel lists every key). */
export function Kbd({ children }: { children: string }) {
  return (
    <kbd className="hidden rounded border border-graphite-400 bg-white px-1 font-sans text-[10px] font-semibold text-graphite-700 shadow-[0_1px_0_#8a8f94] xl:inline">
      {children}
    </kbd>
  );
}
