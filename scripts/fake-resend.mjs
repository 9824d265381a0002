// A stand-in for the e-mail service's HTTP API, on loopback only, so that development and tests run
// the real SDK code path without sending anything. It keeps what it receives in memory:
//   POST /emails    send (needs from, to, subject) → { id }
//   GET /emails     everything received, newest first → { data: [...] }
//   GET /emails/:id one of them, attachments included (content as the SDK sent it: base64)
//   DELETE /emails  forget everything
// Run it alone with `node scripts/fake-resend.mjs` (port FAKE_RESEND_PORT, default 3025).
import { randomUUID } from "node:crypto";
import { createServer } from "node:http";
import { pathToFileURL } from "node:url";

export const DEFAULT_FAKE_RESEND_PORT = 3025;
const KEEP_AT_MOST = 500;
const BODY_LIMIT_BYTES = 1_000_000;

function answer(response, status, body) {
  response.writeHead(status, { "content-type": "application/json" });
  response.end(JSON.stringify(body));
}

function refuse(response, statusCode, name, message) {
  answer(response, statusCode, { statusCode, name, message });
}

function readBody(request) {
  return new Promise((resolve, reject) => {
    const chunks = [];
    let size = 0;
    request.on("data", (chunk) => {
      size += chunk.length;
      if (size > BODY_LIMIT_BYTES) {
        reject(new Error("too large"));
        request.destroy();
      } else chunks.push(chunk);
    });
    request.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    request.on("error", reject);
  });
}

/** The first required field that is missing or blank, if any. */
function missingField(email) {
  const blank = (value) => value === undefined || value === null || (typeof value === "string" && value.trim() === "");
  if (blank(email.from)) return "from";
  if (blank(email.to) || (Array.isArray(email.to) && email.to.length === 0)) return "to";
  if (blank(email.subject)) return "subject";
  return null;
}

/** What is wrong with the attachments, as the service would refuse them; null when they are fine or absent. */
function badAttachments(attachments) {
  if (attachments === undefined || attachments === null) return null;
  if (!Array.isArray(attachments)) return "`attachments` must be an array.";
  for (const [index, attachment] of attachments.entries()) {
    if (typeof attachment !== "object" || attachment === null) return `\`attachments[${index}]\` must be an object.`;
    if (typeof attachment.filename !== "string" || attachment.filename === "") return `\`attachments[${index}].filename\` is missing.`;
    if (typeof attachment.content !== "string" && typeof attachment.path !== "string") return `\`attachments[${index}]\` needs \`content\` or \`path\`.`;
  }
  return null;
}

/**
 * Starts the fake. `port: 0` picks a free port. `failWith` makes every send answer that error, to
 * see how callers cope with a refusal; with `failWith.times`, only that many sends fail, then it recovers.
 */
export function startFakeResend({ port = DEFAULT_FAKE_RESEND_PORT, host = "127.0.0.1", failWith } = {}) {
  const received = [];
  const idsByIdempotencyKey = new Map();
  let failuresLeft = failWith?.times ?? Infinity;

  async function send(request, response) {
    if (!/^Bearer \S+/.test(request.headers.authorization ?? "")) {
      return refuse(response, 401, "missing_api_key", "Missing API key in the authorization header.");
    }
    if (failWith && failuresLeft > 0) {
      failuresLeft -= 1;
      return refuse(response, failWith.statusCode, failWith.name, failWith.message);
    }
    let email;
    try {
      email = JSON.parse(await readBody(request));
    } catch {
      return refuse(response, 422, "validation_error", "The body must be a JSON object of at most 1 MB.");
    }
    if (typeof email !== "object" || email === null || Array.isArray(email)) {
      return refuse(response, 422, "validation_error", "The body must be a JSON object.");
    }
    const missing = missingField(email);
    if (missing) return refuse(response, 422, "missing_required_field", `Missing \`${missing}\` field.`);
    const attachmentProblem = badAttachments(email.attachments);
    if (attachmentProblem) return refuse(response, 422, "validation_error", attachmentProblem);
    const idempotencyKey = request.headers["idempotency-key"];
    if (typeof idempotencyKey === "string" && idsByIdempotencyKey.has(idempotencyKey)) {
      return answer(response, 200, { id: idsByIdempotencyKey.get(idempotencyKey) });
    }
    const id = randomUUID();
    if (typeof idempotencyKey === "string") idsByIdempotencyKey.set(idempotencyKey, id);
    received.unshift({ id, created_at: new Date().toISOString(), ...email });
    received.length = Math.min(received.length, KEEP_AT_MOST);
    answer(response, 200, { id });
  }

  const server = createServer((request, response) => {
    const path = new URL(request.url ?? "/", "http://fake").pathname.replace(/\/+$/, "");
    const one = /^\/emails\/([^/]+)$/.exec(path);
    if (path === "/emails" && request.method === "POST") {
      send(request, response).catch(() => refuse(response, 500, "internal_server_error", "The fake failed to read the request."));
    } else if (path === "/emails" && request.method === "GET") answer(response, 200, { object: "list", data: received });
    else if (path === "/emails" && request.method === "DELETE") {
      received.length = 0;
      idsByIdempotencyKey.clear();
      answer(response, 200, { deleted: true });
    } else if (one && request.method === "GET") {
      const email = received.find((item) => item.id === one[1]);
      if (email) answer(response, 200, { object: "email", ...email });
      else refuse(response, 404, "not_found", "Email not found.");
    } else refuse(response, 404, "not_found", "The fake answers only /emails.");
  });

  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      const address = server.address();
      const boundPort = typeof address === "object" && address ? address.port : port;
      resolve({
        url: `http://${host}:${boundPort}`,
        port: boundPort,
        received: () => [...received],
        close: () =>
          new Promise((done) => {
            server.close(() => done());
            server.closeAllConnections();
          }),
      });
    });
  });
}

const runDirectly = process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href;
if (runDirectly) {
  const port = Number(process.env.FAKE_RESEND_PORT || DEFAULT_FAKE_RESEND_PORT);
  startFakeResend({ port }).then(
    (fake) => {
      console.log(`Fake e-mail service on ${fake.url}: read what was sent with GET ${fake.url}/emails`);
      const stop = () => fake.close().then(() => process.exit(0));
      process.on("SIGINT", stop);
      process.on("SIGTERM", stop);
    },
    (error) => {
      console.error(
        error?.code === "EADDRINUSE"
          ? `Port ${port} is already in use. Stop what is using it, or set FAKE_RESEND_PORT to a free port.`
          : `The fake e-mail service could not start: ${error?.message ?? error}`,
      );
      process.exit(1);
    },
  );
}
