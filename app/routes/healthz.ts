import { databaseIsUp } from "~/services/health.server";

/** For the load balancer: the app answers and can reach its database (the driver's own words stay in the log). */
export async function loader() {
  const started = Date.now();
  if (await databaseIsUp()) return Response.json({ status: "ok", database: { state: "up", ms: Date.now() - started } });
  return Response.json({ status: "degraded", database: { state: "down" } }, { status: 503, headers: { "Retry-After": "30" } });
}
