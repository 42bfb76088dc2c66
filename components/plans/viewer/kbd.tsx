export function Kbd({ children }: { children: string }) {
  return <kbd className="rounded border border-graphite-400 bg-white px-1 font-sans text-[10px] font-semibold text-graphite-700 shadow-[0_1px_0_#8a8f94]">{children}</kbd>;
}
