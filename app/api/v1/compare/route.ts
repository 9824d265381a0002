import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { readSizeList } from "@/lib/compare/read-sizes";
import { compareSizes } from "@/lib/tire";

const compareQuery = z.object({ sizes: z.string().trim().min(1, "list two to four sizes") });

export function GET(request: NextRequest) {
  const query = parseQuery(request.nextUrl, compareQuery);
  if (!query.ok) return query.response;
  const list = readSizeList(query.value.sizes, 2);
  if (!list.ok) return apiError(list.code, list.message);
  return NextResponse.json({ sizes: compareSizes(list.sizes) }, { headers: { "Cache-Control": "public, max-age=86400" } });
}
