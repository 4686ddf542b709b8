import { type RouteConfig, index, layout, route } from "@react-router/dev/routes";

export default [
  route("login", "routes/login.tsx"),
  route("logout", "routes/logout.tsx"),
  route("healthz", "routes/healthz.ts"),
  route("api/guides/search", "routes/api.guides.search.ts"),
  route("api/calc/:kind", "routes/api.calc.$kind.ts"),
  route("api/cases", "routes/api.cases.ts"),
  route("api/cases/:id", "routes/api.cases.$id.ts"),
  route("api/cases/:id/events", "routes/api.cases.$id.events.ts"),
  route("api/cases/:id/close", "routes/api.cases.$id.close.ts"),
  route("api/cases/:id/photos", "routes/api.cases.$id.photos.ts"),
  route("cases/:id/photos/:photoId", "routes/cases.$id.photos.$photoId.ts"),
  route("rigs/:code/label", "routes/rigs.$code.label.tsx"),
  layout("routes/shell.tsx", [
    index("routes/home.tsx"),
    route("rigs", "routes/rigs.tsx"),
    route("rigs/new", "routes/rigs.new.tsx"),
    route("rigs/:code", "routes/rigs.$code.tsx"),
    route("rigs/:code/edit", "routes/rigs.$code.edit.tsx"),
    route("rigs/:code/fix", "routes/rigs.$code.fix.tsx"),
    route("cases/:id", "routes/cases.$id.tsx"),
    route("cases/:id/walk", "routes/cases.$id.walk.tsx"),
    route("admin/outbox", "routes/admin.outbox.tsx"),
    route("tools", "routes/tools.tsx"),
    route("tools/:tool", "routes/tools.$tool.tsx"),
  ]),
] satisfies RouteConfig;
