import { NextResponse } from "next/server";
import { openApiDocument } from "@/lib/api/openapi/app-document";

// The document depends on no request, so the build writes it once.
export const dynamic = "force-static";

/** Public: the OpenAPI 3.1 description of every route, generated from the schemas the handlers validate with. */
export function GET() {
  return NextResponse.json(openApiDocument());
}
