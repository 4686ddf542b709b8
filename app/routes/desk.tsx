import { Outlet } from "react-router";
import { SafetyCaution } from "~/components/walk/safety-caution";
import { requirePermission } from "~/services/guards.server";
import type { Route } from "./+types/desk";

export async function loader({ request, context }: Route.LoaderArgs) {
  await requirePermission({ request, context }, "edit-guides");
  return null;
}

/** Every guide desk page carries the shut-down caution above its content. */
export default function DeskLayout() {
  return (
    <>
      <div className="mb-4">
        <SafetyCaution />
      </div>
      <Outlet />
    </>
  );
}
