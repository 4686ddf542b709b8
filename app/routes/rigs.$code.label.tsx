import QRCode from "qrcode";
import { requireUser } from "~/services/guards.server";
import { env } from "~/services/env.server";
import { findRig } from "~/services/rigs.server";
import type { Route } from "./+types/rigs.$code.label";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const rig = await findRig(user, params.code);
  const url = `${env().APP_URL}/rigs/${rig.code}/fix`;
  const svg = await QRCode.toString(url, { type: "svg", errorCorrectionLevel: "M", margin: 1, color: { dark: "#000000", light: "#ffffff" } });
  return { code: rig.code, name: rig.name, company: user.companyName, url, svg };
}

/** A printable label for the rig: scanning it opens "start a fix" for this rig. */
export default function RigLabel({ loaderData }: Route.ComponentProps) {
  const { code, name, company, url, svg } = loaderData;
  return (
    <main className="mx-auto max-w-sm bg-white p-3 text-black sm:p-6">
      <div className="overflow-hidden rounded-xl border-8 border-black p-3 text-center sm:p-5">
        <p className="text-lg font-bold">{company}</p>
        <h1 className="text-5xl font-bold tracking-wide break-all sm:text-6xl">{code}</h1>
        <p className="text-xl">{name}</p>
        {/* The SVG comes from the QR library, built from our own URL; no user text is in it. */}
        <div
          className="mx-auto my-4 w-full max-w-64 [&_svg]:block [&_svg]:h-auto [&_svg]:w-full"
          data-testid="rig-qr"
          role="img"
          aria-label={`QR code for ${url}`}
          dangerouslySetInnerHTML={{ __html: svg }}
        />
        <p className="text-lg font-bold">Rig acting up? Scan to start a fix.</p>
        <p className="mt-1 text-sm break-all">{url}</p>
      </div>
      <button type="button" onClick={() => window.print()} className="no-print mt-4 min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
        Print label
      </button>
    </main>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Label ${data?.code ?? ""} · Tankside` }];
