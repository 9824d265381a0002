/** Signs in as the demo staff account on a running server and answers the session's Cookie header. */
export async function signInAsStaff(url: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { origin: url, "content-type": "application/json", "x-forwarded-for": "10.99.0.1" },
    body: JSON.stringify({ email: "staff@sidewise.test", password: "sidewise-demo" }),
  });
  if (!response.ok) throw new Error(`staff sign-in answered ${response.status}`);
  return response.headers.getSetCookie().map((cookie) => cookie.split(";")[0]).join("; ");
}
