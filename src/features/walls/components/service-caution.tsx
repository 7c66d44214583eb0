import { ShieldAlert } from 'lucide-react';

/** The service caution shown beside the wall map for people who open cabinets. */
export function ServiceCaution({ className }: { className?: string }) {
  return (
    <div
      role="note"
      className={`flex gap-3 rounded-md border border-state-at-risk-dot/50 bg-state-at-risk-bg px-3.5 py-3 text-state-at-risk ${className ?? ''}`}
    >
      <ShieldAlert className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true" />
      <p className="text-sm sm:text-base">
        <span className="font-semibold">Service safety: </span>
        Isolate power before opening a cabinet; handle modules with ESD protection; use proper access equipment when working at height.
      </p>
    </div>
  );
}

/** Ground-stacked and flown walls: the structure is not this tool's to compute. */
export function StructureCaution() {
  return (
    <p role="note" className="rounded border border-stone-200 bg-stone-50 px-3 py-2 text-sm text-stone-700">
      Ground-stacked and flown walls follow the manufacturer's instructions and a qualified engineer's design; ballast and rigging are not
      computed by this tool.
    </p>
  );
}
