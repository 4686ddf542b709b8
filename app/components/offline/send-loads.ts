import { forgetLoad, loadsToSend, loadsToTakeBack, updateLoad } from "~/lib/jobs/kept-loads";

/**
 * Sends the loads marked sprayed that wait on the phone. "waiting" when the connection dropped
 * (the rest go next time), "signed-out" when the sign-in ended; a refusal is kept on the load.
 */
export async function sendKeptLoads(store: Storage = window.localStorage): Promise<"sent" | "waiting" | "signed-out"> {
  for (const load of loadsToSend(store)) {
    const { jobId, number: _number, sent: _sent, refused: _refused, ...body } = load;
    let res: Response;
    try {
      res = await fetch(`/api/jobs/${jobId}/loads`, {
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify(body),
        credentials: "same-origin",
      });
    } catch {
      return "waiting";
    }
    if (res.status === 401) return "signed-out";
    if (res.ok) updateLoad(store, load.id, { sent: true });
    // A timeout, a busy server or a server error: waiting cures it.
    else if (res.status >= 500 || res.status === 408 || res.status === 429) return "waiting";
    else {
      const said = (await res.json().catch(() => null)) as { error?: string } | null;
      updateLoad(store, load.id, { refused: `Not taken: ${said?.error ?? `the server refused it (${res.status}).`}` });
    }
  }
  for (const load of loadsToTakeBack(store)) {
    let res: Response;
    try {
      res = await fetch(`/api/jobs/${load.jobId}/loads/${load.id}`, { method: "DELETE", credentials: "same-origin" });
    } catch {
      return "waiting";
    }
    if (res.status === 401) return "signed-out";
    // Gone already (404) is as good as taken back.
    if (res.ok || res.status === 404) forgetLoad(store, load.id);
    else if (res.status >= 500 || res.status === 408 || res.status === 429) return "waiting";
    else {
      const said = (await res.json().catch(() => null)) as { error?: string } | null;
      updateLoad(store, load.id, { takeBack: false, refused: `Still counted: ${said?.error ?? `the server kept it (${res.status}).`}` });
    }
  }
  return "sent";
}
