import { newFitCardSchema } from "@/lib/fit-cards/card-input";
import type { FitCardDraft } from "./save-fit-card-button";

export type SaveOutcome =
  | { ok: true; url: string }
  | { ok: false; message: string; fieldErrors: Record<string, string>; signIn?: boolean };

const text = (form: FormData, name: string) => {
  const value = form.get(name);
  return typeof value === "string" && value.trim() !== "" ? value.trim() : undefined;
};
const whole = (value: string | undefined) => (value === undefined || !/^\d+$/.test(value) ? value : Number(value));

/** Checks the card in the browser, with a message per field, then saves it through POST /api/v1/fit-cards. */
export async function postFitCard(draft: FitCardDraft, form: FormData): Promise<SaveOutcome> {
  const body = {
    sizes: draft.sizes,
    skus: draft.skus ?? [],
    loadIndex: draft.loadIndex ?? whole(text(form, "loadIndex")),
    loadIndexDual: draft.loadIndexDual,
    speedSymbol: draft.speedSymbol ?? text(form, "speedSymbol"),
    loadRange: draft.loadRange,
    runFlat: draft.runFlat,
    minLoadIndex: draft.minLoadIndex,
    minLoadIndexDual: draft.minLoadIndexDual,
    originalSeason: draft.originalSeason,
    tolerancePct: draft.tolerancePct,
    wear: draft.wear,
    note: text(form, "note"),
    expiresInDays: whole(text(form, "expiresInDays")),
  };
  const parsed = newFitCardSchema.safeParse(body);
  if (!parsed.success) {
    const fieldErrors: Record<string, string> = {};
    for (const issue of parsed.error.issues) {
      const name = String(issue.path[0] ?? "form");
      fieldErrors[name] ??= name === "loadIndex" ? "Type the load index from the sidewall, 0–279." : name === "speedSymbol" ? "Type the speed symbol from the sidewall, such as H or V." : issue.message;
    }
    return { ok: false, message: "Some fields need another look.", fieldErrors };
  }
  try {
    const response = await fetch("/api/v1/fit-cards", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(parsed.data) });
    const answer = (await response.json().catch(() => null)) as { url?: string; error?: { message?: string } } | null;
    if (response.status === 201 && answer?.url) return { ok: true, url: answer.url };
    if (response.status === 401) return { ok: false, message: "Sign in to save a Fit card.", fieldErrors: {}, signIn: true };
    return { ok: false, message: answer?.error?.message ?? "The card could not be saved. Please try again.", fieldErrors: {} };
  } catch {
    return { ok: false, message: "The shop's server could not be reached. Check the connection and try again.", fieldErrors: {} };
  }
}
