/** Posts to one of the sign-in service's endpoints; answers the message to show when it refuses. */
export async function postAuth(path: string, body: unknown): Promise<{ ok: true } | { ok: false; message: string }> {
  try {
    const response = await fetch(`/api/auth/${path}`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    });
    if (response.ok) return { ok: true };
    const answer = (await response.json().catch(() => null)) as { message?: unknown } | null;
    return { ok: false, message: typeof answer?.message === "string" ? answer.message : "That did not work. Please try again." };
  } catch {
    return { ok: false, message: "The shop's server could not be reached. Check the connection and try again." };
  }
}
