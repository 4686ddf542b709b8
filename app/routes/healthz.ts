import { sequelize } from "~/services/db.server";

export async function loader() {
  const started = Date.now();
  try {
    await sequelize.query("SELECT 1");
    return Response.json({ status: "ok", database: { state: "up", ms: Date.now() - started } });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    return Response.json({ status: "degraded", database: { state: "down", error: message } }, { status: 503 });
  }
}
