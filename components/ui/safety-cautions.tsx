import { safetyCautions } from "@/content/safety";

/** The usual cautions, shown wherever a size or a tire is being chosen; a page about wheels passes its own list. */
export function SafetyCautions({ cautions = safetyCautions }: { cautions?: readonly string[] }) {
  return (
    <aside aria-labelledby="safety-heading" className="rounded border-l-4 border-caution bg-caution-soft p-4 text-sm text-ink">
      <h2 id="safety-heading" className="font-semibold">
        Before you choose
      </h2>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </aside>
  );
}
