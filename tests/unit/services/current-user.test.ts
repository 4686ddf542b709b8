import { RouterContextProvider } from "react-router";
import { beforeEach, describe, expect, it, vi } from "vitest";

// The lookup itself is the database's business; here only how often it runs matters.
const findByPk = vi.fn();
vi.mock("~/services/db.server", () => ({ Company: {}, User: { findByPk: (...args: unknown[]) => findByPk(...args) } }));
vi.mock("~/services/session.server", () => ({ getSession: async () => ({ get: () => 7 }) }));

const { currentUser, requirePermission, requireUser } = await import("~/services/guards.server");

const person = {
  id: 7,
  name: "Rosa Vey",
  email: "rosa@example.test",
  role: "supervisor",
  companyId: 3,
  accessRemovedAt: null,
  Company: { name: "Mesa Green", timeZone: "America/Denver" },
};

describe("the signed-in person is looked up once per request", () => {
  beforeEach(() => {
    findByPk.mockReset();
    findByPk.mockResolvedValue(person);
  });

  it("shares one lookup between every loader of one request", async () => {
    const request = new Request("http://127.0.0.1/desk");
    const context = new RouterContextProvider();
    const [a, b] = await Promise.all([requireUser({ request, context }), requirePermission({ request, context }, "read-board")]);
    await currentUser({ request, context });
    expect(a).toEqual(b);
    expect(a.timeZone).toBe("America/Denver");
    expect(findByPk).toHaveBeenCalledTimes(1);
  });

  it("looks up again for the next request", async () => {
    const request = new Request("http://127.0.0.1/desk");
    await requireUser({ request, context: new RouterContextProvider() });
    await requireUser({ request, context: new RouterContextProvider() });
    expect(findByPk).toHaveBeenCalledTimes(2);
  });

  it("refuses a role below the permission's lowest role with a 403 that names it", async () => {
    findByPk.mockResolvedValue({ ...person, role: "crew" });
    const thrown = await requirePermission({ request: new Request("http://127.0.0.1/api/board"), context: new RouterContextProvider() }, "read-board").catch(
      (e) => e,
    );
    expect(thrown.init.status).toBe(403);
    expect(thrown.data.error).toMatch(/supervisor role/);
  });
});
