import type { NextStep as Step } from "@/lib/portal/next-steps";

export function NextStep({ next }: { next: Step }) {
  return (
    <div className="text-sm">
      <p className="font-semibold">{next.headline}</p>
      <p className="text-muted">{next.detail}</p>
      {next.when && <p className="mt-1">{next.when}</p>}
    </div>
  );
}
