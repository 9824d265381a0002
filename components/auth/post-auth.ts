export type PostAuthResult = { ok: true } | { ok: false; message: string; code?: string };

/** Posts to one of the sign-in service's endpoints; answers the message to show (and its code) when it refuses. */
export async function postAuth(path: string, body: unknown): Promise<PostAuthResult> {
  try {
    const response = await fetch(`/api/auth/${path}`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    });
    if (response.ok) return { ok: true };
    const answer = (await response.json().catch(() => null)) as { message?: unknown; code?: unknown } | null;
    return {
      ok: false,
      message: typeof answer?.message === "string" ? answer.message : "That did not work. Please try again.",
      code: typeof answer?.code === "string" ? answer.code : undefined,
    };
  } catch {
    return { ok: false, message: "The shop's server could not be reached. Check the connection and try again." };
  }
}
