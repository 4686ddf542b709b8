import { sequelize } from "~/services/db.server";

export async function loader() {
  const started = Date.now();
  try {
    await sequelize.query("SELECT 1");
    return Response.json({ status: "ok", database: { state: "up", ms: Date.now() - started } });
  } catch {
    // The driver's own words stay in the server's log, not in an answer anyone can read.
    return Response.json({ status: "degraded", database: { state: "down" } }, { status: 503, headers: { "Retry-After": "30" } });
  }
}
