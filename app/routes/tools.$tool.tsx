import { Form, useSubmit } from "react-router";
import { HoseCalc } from "~/components/calc/hose-calc";
import { LoadSheetCalc } from "~/components/calc/load-sheet-calc";
import { SuctionCalc } from "~/components/calc/suction-calc";
import { TorqueCalc } from "~/components/calc/torque-calc";
import { PageTitle } from "~/components/ui/page-title";
import { toolById } from "~/lib/tools";
import { notFound, requireUser } from "~/services/guards.server";
import { rigSpecsFor } from "~/services/rig-specs.server";
import type { Route } from "./+types/tools.$tool";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const tool = toolById(params.tool);
  if (!tool) notFound("That calculator");
  const rigs = await rigSpecsFor(user);
  const wanted = new URL(request.url).searchParams.get("rig")?.toUpperCase();
  const rig = rigs.find((r) => r.code === wanted) ?? rigs[0] ?? null;
  return { tool, rigs: rigs.map((r) => ({ code: r.code, name: r.name })), rig };
}

const CALCS = { load: LoadSheetCalc, hose: HoseCalc, suction: SuctionCalc, torque: TorqueCalc };

export default function Tool({ loaderData }: Route.ComponentProps) {
  const { tool, rigs, rig } = loaderData;
  const submit = useSubmit();
  const Calc = CALCS[tool.id];
  return (
    <>
      <PageTitle lead={tool.lead}>{tool.title}</PageTitle>
      {rigs.length ? (
        <Form method="get" className="no-print mb-4" onChange={(e) => submit(e.currentTarget)}>
          <label htmlFor="rig" className="block font-bold">
            Filled from rig
          </label>
          <select id="rig" name="rig" defaultValue={rig?.code} className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg">
            {rigs.map((r) => (
              <option key={r.code} value={r.code}>
                {r.code} · {r.name}
              </option>
            ))}
          </select>
          <noscript>
            <button className="mt-2 min-h-12 rounded-md border-2 border-ink px-3 font-bold">Use this rig</button>
          </noscript>
        </Form>
      ) : null}
      {/* Re-mount on a new rig so every field starts from that rig's specs. */}
      <Calc key={rig?.code ?? "none"} rig={rig ?? undefined} />
      {tool.id === "load" ? (
        <button type="button" onClick={() => window.print()} className="no-print mt-4 min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
          Print the load sheet
        </button>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.tool.title ?? "Field math"} · Tankside` }];
