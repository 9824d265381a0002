import { z } from "zod";
import { apiErrorBodySchema, apiErrorStatus, type ApiErrorCode } from "@/lib/api/errors";
import { componentRef, componentSchemas, jsonSchemaOf, parametersOf } from "./json-schema";
import { errorCodesOf, named, type ApiAnswer, type ApiOperation } from "./operation";

const OPENAPI_VERSION = "3.1.1";
const ERROR_SCHEMA = "Error";
const SESSION = "session";

const ACCESS_WORDS: Record<ApiOperation["access"], string> = {
  public: "Public.",
  customer: "Any signed-in account.",
  staff: "Staff and admin accounts.",
  admin: "Admin accounts.",
};

const DESCRIPTION = [
  "JSON; numbers are unrounded (the UI rounds for display). `diameterDiffPct` = (this − reference) ÷ reference × 100, signed.",
  'Errors are `{"error":{"code","message"}}`, with `"field"` when the error is about one parameter or body field; each operation lists the codes it can answer.',
  "Bad input never gets a 5xx. Protected routes answer 401 `unauthenticated` without a session and 403 `forbidden` without the role;",
  "every state-changing request whose Origin (or, without one, Referer) is not the app's own address answers 403 `forbidden`.",
].join(" ");

const SESSION_SCHEME = {
  type: "apiKey",
  in: "cookie",
  name: "better-auth.session_token",
  description:
    "The session cookie the sign-in service sets: POST /api/auth/sign-in/email with {email, password}. Over HTTPS it is named __Secure-better-auth.session_token.",
};

const RETRY_AFTER = { "Retry-After": { description: "Seconds to wait before trying again.", schema: jsonSchemaOf(z.string().regex(/^\d+$/), "output") } };

function answerObject(answer: ApiAnswer) {
  const content = answer.json
    ? { "application/json": { schema: componentRef(answer.json.name) } }
    : answer.csv
      ? { "text/csv": { schema: { type: "string", description: answer.csv } } }
      : undefined;
  const headers = answer.headers
    ? Object.fromEntries(Object.entries(answer.headers).map(([name, { description, schema }]) => [name, { description, schema: jsonSchemaOf(schema, "output") }]))
    : undefined;
  return { description: answer.description, ...(headers ? { headers } : {}), ...(content ? { content } : {}) };
}

/** One response per error status, its schema the shared error shape narrowed to the codes this operation answers with. */
function errorResponses(codes: readonly ApiErrorCode[]) {
  const byStatus = new Map<number, ApiErrorCode[]>();
  for (const code of codes) byStatus.set(apiErrorStatus[code], [...(byStatus.get(apiErrorStatus[code]) ?? []), code]);
  return new Map(
    [...byStatus].map(([status, grouped]) => [
      status,
      {
        description: grouped.map((code) => `\`${code}\``).join(", "),
        ...(grouped.includes("rate_limited") ? { headers: RETRY_AFTER } : {}),
        content: {
          "application/json": {
            schema: {
              allOf: [componentRef(ERROR_SCHEMA), { type: "object", properties: { error: { type: "object", properties: { code: { type: "string", enum: grouped } } } } }],
            },
          },
        },
      },
    ]),
  );
}

function operationObject(operation: ApiOperation) {
  const parameters = [
    ...(operation.params ? parametersOf(operation.params, "path") : []),
    ...(operation.query ? parametersOf(operation.query, "query") : []),
    ...(operation.headers ? parametersOf(operation.headers, "header") : []),
  ];
  const requestBody = operation.body
    ? { required: true, content: { "application/json": { schema: componentRef(operation.body.name) } } }
    : operation.form
      ? { required: true, content: { "multipart/form-data": { schema: componentRef(operation.form.name) } } }
      : undefined;
  const responses = new Map<number, object>(operation.answers.map((answer) => [answer.status, answerObject(answer)]));
  for (const [status, response] of errorResponses(errorCodesOf(operation))) {
    if (responses.has(status)) throw new Error(`${operation.method.toUpperCase()} ${operation.path} answers ${status} both as an error and otherwise`);
    responses.set(status, response);
  }
  return {
    tags: [operation.tag],
    summary: operation.summary,
    description: [ACCESS_WORDS[operation.access], operation.description].filter(Boolean).join(" "),
    ...(operation.access === "public" ? {} : { security: [{ [SESSION]: [] }] }),
    ...(parameters.length > 0 ? { parameters } : {}),
    ...(requestBody ? { requestBody } : {}),
    responses: Object.fromEntries([...responses].sort(([a], [b]) => a - b).map(([status, response]) => [String(status), response])),
  };
}

/** The OpenAPI 3.1 document of the given operations: pure, built from the zod schemas the handlers validate with. */
export function buildOpenApiDocument(operations: readonly ApiOperation[]) {
  const answers = operations.flatMap((operation) => operation.answers.flatMap((answer) => (answer.json ? [answer.json] : [])));
  const requests = operations.flatMap((operation) => [operation.body, operation.form].filter((body) => body !== undefined));
  const answerSchemas = componentSchemas([named(ERROR_SCHEMA, apiErrorBodySchema), ...answers], "output");
  const requestSchemas = componentSchemas(requests, "input");
  const clash = Object.keys(requestSchemas).find((name) => name in answerSchemas);
  if (clash) throw new Error(`a request and an answer both go by the name ${clash}`);

  const paths: Record<string, Record<string, object>> = {};
  for (const operation of operations) {
    const item = (paths[operation.path] ??= {});
    if (item[operation.method]) throw new Error(`${operation.method.toUpperCase()} ${operation.path} is described twice`);
    item[operation.method] = operationObject(operation);
  }
  return {
    openapi: OPENAPI_VERSION,
    info: { title: "Sidewise API", version: "1", description: DESCRIPTION },
    tags: [...new Set(operations.map((operation) => operation.tag))].map((name) => ({ name })),
    paths,
    components: { schemas: { ...answerSchemas, ...requestSchemas }, securitySchemes: { [SESSION]: SESSION_SCHEME } },
  };
}

export type OpenApiDocument = ReturnType<typeof buildOpenApiDocument>;
