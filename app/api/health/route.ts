import { connection, NextResponse } from "next/server";
import { getDatabaseHandle } from "@/lib/database/app-database";
import { checkDatabase } from "@/lib/health/check-database";

export async function GET() {
  await connection();
  const report = await checkDatabase(getDatabaseHandle);
  return NextResponse.json(report.body, { status: report.ok ? 200 : 503, headers: { "Cache-Control": "no-store" } });
}
