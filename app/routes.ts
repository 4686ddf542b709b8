import { type RouteConfig, index, layout, route } from "@react-router/dev/routes";

export default [
  route("login", "routes/login.tsx"),
  route("logout", "routes/logout.tsx"),
  route("healthz", "routes/healthz.ts"),
  route("api/guides/search", "routes/api.guides.search.ts"),
  route("api/cases", "routes/api.cases.ts"),
  route("api/cases/:id", "routes/api.cases.$id.ts"),
  route("api/cases/:id/events", "routes/api.cases.$id.events.ts"),
  route("api/cases/:id/close", "routes/api.cases.$id.close.ts"),
  layout("routes/shell.tsx", [
    index("routes/home.tsx"),
    route("rigs", "routes/rigs.tsx"),
    route("rigs/new", "routes/rigs.new.tsx"),
    route("rigs/:code", "routes/rigs.$code.tsx"),
    route("rigs/:code/edit", "routes/rigs.$code.edit.tsx"),
  ]),
] satisfies RouteConfig;
