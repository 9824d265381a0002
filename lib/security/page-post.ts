import { readBodyBytes } from "@/lib/api/body";
import { apiError } from "@/lib/api/errors";
import { appOrigin } from "@/lib/auth/auth-env";
import { checkRequestOrigin, isStateChanging } from "./request-origin";

/** Next.js's own limit on a server action's body (`serverActions.bodySizeLimit`, 1 MB by default). */
export const ACTION_BODY_LIMIT_BYTES = 1024 * 1024;

const ACTION_ID = /^[0-9a-f]{2,128}$/i;
const FORM_REFERENCE = /^\$K[0-9a-f]+$/;

/**
 * A value of React's reply encoding (how a server action's arguments travel) that the app's own
 * forms produce: plain JSON, where a string starting with "$" is an escaped "$$…", "$undefined", or
 * (in a multipart body) "$K…", a reference to the form's fields. Every other "$" reference makes
 * React's decoder throw, which Next.js answers with 500.
 */
function isPlainReplyValue(value: unknown, formReferences: boolean): boolean {
  if (typeof value === "string") {
    return !value.startsWith("$") || value.startsWith("$$") || value === "$undefined" || (formReferences && FORM_REFERENCE.test(value));
  }
  if (Array.isArray(value)) return value.every((item) => isPlainReplyValue(item, formReferences));
  if (typeof value === "object" && value !== null) return Object.values(value).every((item) => isPlainReplyValue(item, formReferences));
  return true;
}

/** The arguments of a server action as the app's forms send them: a JSON array of plain values. */
export function isWellFormedReply(root: string, formReferences: boolean): boolean {
  try {
    const parsed: unknown = JSON.parse(root);
    return Array.isArray(parsed) && isPlainReplyValue(parsed, formReferences);
  } catch {
    return false;
  }
}

async function isWellFormedActionBody(bytes: Uint8Array<ArrayBuffer>, contentType: string): Promise<boolean> {
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    try {
      return isWellFormedReply(new TextDecoder("utf-8", { fatal: true }).decode(bytes), false);
    } catch {
      return false;
    }
  }
  try {
    const root = (await new Response(bytes, { headers: { "content-type": contentType } }).formData()).get("0");
    return typeof root === "string" && isWellFormedReply(root, true);
  } catch {
    return false;
  }
}

/**
 * A page takes a state-changing request only as one of the app's own server actions. Next.js
 * handles those before any code of ours runs and answers 500 to a foreign origin or a body its
 * decoder cannot read, so this refuses them first: 403 forbidden for another origin (as withAction
 * does), 413 over Next.js's body limit, 400 for anything that is not a well-formed action call.
 * Null lets the request through.
 */
export async function refusePagePost(request: Request): Promise<Response | null> {
  if (!isStateChanging(request.method)) return null;
  const origin = checkRequestOrigin(request.headers, appOrigin());
  if (!origin.ok) return apiError("forbidden", origin.message);
  const notAnAction = () => apiError("invalid_parameter", "This address takes no posted data but the app's own forms.");
  const actionId = request.headers.get("next-action");
  if (request.method !== "POST" || actionId === null || !ACTION_ID.test(actionId)) return notAnAction();
  const read = await readBodyBytes(request, ACTION_BODY_LIMIT_BYTES);
  if (!read.ok) return apiError("too_large", `A form's data may be at most ${ACTION_BODY_LIMIT_BYTES / 1024 / 1024} MB.`);
  return (await isWellFormedActionBody(read.bytes, request.headers.get("content-type") ?? "")) ? null : notAnAction();
}
