import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { Case, Invite } from "../../db/index";
import { action as peopleAction } from "~/routes/admin.people";
import { action as boardAction } from "~/routes/board";
import { action as closeAction } from "~/routes/api.cases.$id.close";
import { action as startAction } from "~/routes/api.cases";
import { action as forgotAction } from "~/routes/forgot";
import { sendAllDigests } from "~/services/digest.server";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

// The mail server refuses everything in this file: what people were doing must still be kept.
vi.mock("nodemailer", () => ({
  default: {
    createTransport: () => ({
      sendMail: async () => {
        throw new Error("connect ECONNREFUSED 127.0.0.1:25");
      },
    }),
  },
}));
vi.spyOn(console, "warn").mockImplementation(() => {});

beforeAll(() => resetDatabase());

describe("with the mail server down", () => {
  it("an invitation is saved and the admin is told to resend it", async () => {
    const res = await run(async () =>
      peopleAction(
        args(
          await requestAs("june@cedarflats.example", "/admin/people", {
            form: { intent: "invite", name: "Pat Quill", email: "pat@cedarflats.example", role: "crew" },
          }),
        ),
      ),
    );
    expect(res.status).toBe(200);
    expect(res.data.message).toMatch(/saved, but the mail server did not take the message/);
    expect(await Invite.count({ where: { email: "pat@cedarflats.example" } })).toBe(1);
  });

  it("asking for a new password answers as usual", async () => {
    const res = await run(() =>
      forgotAction(args(new Request("http://127.0.0.1/forgot", { method: "POST", body: new URLSearchParams({ email: "dana@cedarflats.example" }) }))),
    );
    expect(res).toMatchObject({ status: 200, data: { sent: true } });
  });

  it("a hand-off still closes the case and says the mail failed", async () => {
    const id = randomUUID();
    const json = (body: unknown) => ({ method: "POST", body: JSON.stringify(body), headers: { "Content-Type": "application/json" } });
    const started = await run(async () =>
      startAction(args(await requestAs("dana@cedarflats.example", "/api/cases", json({ id, rigCode: "CF-07", guideSlug: "lost-prime" })))),
    );
    expect(started.status).toBe(201);
    const closed = await run(async () =>
      closeAction(args(await requestAs("dana@cedarflats.example", `/api/cases/${id}/close`, json({ outcome: "handoff", finalStep: "handoff-pump" })), { id })),
    );
    expect(closed.status).toBe(200);
    expect(closed.data).toMatchObject({ outcome: "handoff", mailFailed: true });
    expect((await Case.findByPk(id))!.outcome).toBe("handoff");
  });

  it("sending the digest now says the mail server refused it, instead of a 500", async () => {
    const res = await run(async () => boardAction(args(await requestAs("june@cedarflats.example", "/board", { form: {} }))));
    expect(res.status).toBe(502);
    expect(res.data).toEqual({ sentTo: [], mailFailed: true });
  });

  it("the weekly digest run tries every company and reports each refusal", async () => {
    const results = await sendAllDigests();
    expect(results.length).toBeGreaterThan(1);
    expect(results.every((r) => r.mailFailed && r.sentTo.length === 0)).toBe(true);
  });
});
