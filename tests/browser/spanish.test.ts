import type { Page } from "playwright-core";
import { describe, expect, it, onTestFinished } from "vitest";
import { Case, CaseEvent, GuideRecord, GuideVersion, Rig, User } from "../../db/index";
import { appAndBrowserForFile, signIn } from "../helpers/app";

const harness = appAndBrowserForFile();

const answer = (p: Page, name: string) => p.getByRole("button", { name, exact: true }).click();
const prompt = (p: Page) => p.locator("#step-prompt");

/** A phone whose browser asks for Mexican Spanish first, as many crews' phones do. */
async function spanishPhone() {
  await harness.browser.context.clearCookies();
  const p = await harness.browser.context.newPage();
  await p.setExtraHTTPHeaders({ "Accept-Language": "es-MX,es;q=0.9,en;q=0.5" });
  return p;
}

describe("a crew member who reads Spanish, at 360×640", () => {
  it("signs in for the first time in Spanish and walks a fix from symptom to the end without English", async () => {
    await User.update({ language: null }, { where: { email: "sam@bluemesa.example" } });
    const rig = await Rig.findOne({ where: { code: "BM-01" } });
    const p = await spanishPhone();
    // Signed out, the page follows the browser.
    await p.goto(`${harness.app.url}/login`);
    expect(await p.locator("html").getAttribute("lang")).toBe("es");
    await p.getByLabel("Correo electrónico").fill("sam@bluemesa.example");
    await p.getByLabel("Contraseña").fill("wrong-password-here");
    await p.getByRole("button", { name: "Entrar" }).click();
    await p.getByText("Ese correo y esa contraseña no corresponden a ninguna cuenta.", { exact: false }).waitFor();
    await p.getByLabel("Contraseña").fill("field-demo-2026");
    await p.getByRole("button", { name: "Entrar" }).click();
    await p.getByRole("heading", { name: "Hola Sam. ¿Qué equipo?" }).waitFor();
    // The first sign-in kept the browser's language as the person's.
    expect((await User.findOne({ where: { email: "sam@bluemesa.example" } }))!.language).toBe("es");
    await p.getByRole("navigation", { name: "Menú" }).getByRole("link", { name: "Arreglar" }).waitFor();

    await p.getByRole("link", { name: /BM-01/ }).first().click();
    await p.getByRole("heading", { name: "¿Qué está haciendo BM-01?" }).waitFor();
    await p.getByLabel("Dilo con tus propias palabras").fill("la bomba no jala agua");
    await p
      .getByRole("region", { name: "Guías que coinciden" })
      .getByRole("button", { name: /La bomba pierde el cebado/ })
      .click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    const caseId = new URL(p.url()).pathname.split("/")[2];

    await expect(prompt(p).textContent()).resolves.toMatch(/¿El agua del tanque está bien arriba de la salida del sumidero\?/);
    await p.getByText("Paso 1", { exact: false }).waitFor();
    await answer(p, "Sí");
    await expect(prompt(p).textContent()).resolves.toMatch(/válvula de succión/);
    await answer(p, "Sí");
    await answer(p, "No");
    // The shut-down stop: its caution and checklist in Spanish, the answer that acknowledges it too.
    await p.getByRole("heading", { name: /Alto de seguridad/ }).waitFor();
    await p.getByText("Los pasos con las manos son solo con el equipo apagado y bloqueado.").waitFor();
    const checklist = p.getByRole("list", { name: "Antes de seguir" });
    await checklist.getByText("Motor apagado, llave fuera y en tu bolsillo.").waitFor();
    await answer(p, "El equipo está apagado y bloqueado");
    await expect(prompt(p).textContent()).resolves.toMatch(/acelerador/);
    await answer(p, "Listo");
    await answer(p, "Listo");
    await answer(p, "Sí");
    await p.getByRole("heading", { name: "Arreglado" }).waitFor();
    await p.getByText("Causa:").waitFor();
    await p.getByText("Motor muy bajo de revoluciones", { exact: false }).waitFor();
    await p.getByLabel(/^Horas del motor ahora/).fill(String(Math.ceil(rig!.engineHours) + 3));
    await answer(p, "Terminar");
    await p.getByText("Caso cerrado y guardado.").waitFor();
    // Nothing on the way was shown in English: no step fell back.
    expect(await p.getByTestId("in-english").count()).toBe(0);
    expect(await p.evaluate(() => document.body.innerText)).not.toMatch(/\b(Yes|Done|Finish|Step \d|Shut-down stop|Before you go on)\b/);

    const events = await CaseEvent.findAll({ where: { caseId }, order: [["seq", "ASC"]] });
    expect(events.map((e) => `${e.stepId}:${e.answer}`)).toEqual([
      "water-level:YES",
      "suction-valve:YES",
      "throttle:NO",
      "stop-throttle:ACK",
      "fix-throttle:DONE",
      "rts-throttle:DONE",
      "holds-after-throttle:YES",
    ]);
    expect(await Case.findByPk(caseId)).toMatchObject({ outcome: "fixed", causeCode: "low-engine-speed" });
    await p.close();
  });

  it("shows a step with no Spanish yet in English, with the marker, and the next one in Spanish", async () => {
    // A newer version of the guide whose first step's English changed after the Spanish was written.
    const record = (await GuideRecord.findOne({ where: { slug: "foaming", companyId: null } }))!;
    const published = (await GuideVersion.findOne({ where: { guideId: record.id, number: record.publishedVersion! } }))!;
    const definition = structuredClone(published.definition);
    const first = definition.initial;
    definition.states[first].meta.prompt = `${definition.states[first].meta.prompt} Look from the top hatch, not over the rim.`;
    const newer = await GuideVersion.create({
      guideId: record.id,
      number: record.publishedVersion! + 100,
      status: "published",
      definition,
      sourceHash: `test-${Date.now()}`,
      authorId: null,
      reviewerId: null,
      changeNote: "English changed after the Spanish",
      reviewComment: null,
      publishedAt: new Date(),
    });
    const before = record.publishedVersion;
    await record.update({ publishedVersion: newer.number });
    onTestFinished(async () => {
      // The version stays (the case walked on it points at it); the guide goes back to its published one.
      await record.update({ publishedVersion: before });
    });

    const p = await spanishPhone();
    await p.goto(`${harness.app.url}/login`);
    await p.getByLabel("Correo electrónico").fill("sam@bluemesa.example");
    await p.getByLabel("Contraseña").fill("field-demo-2026");
    await p.getByRole("button", { name: "Entrar" }).click();
    await p.getByRole("heading", { name: "Hola Sam. ¿Qué equipo?" }).waitFor();
    await p.goto(`${harness.app.url}/rigs/BM-01/fix`);
    await p.getByRole("button", { name: /Espuma en el tanque/ }).click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    await p.getByTestId("in-english").getByText("En inglés: este paso aún no tiene español.").waitFor();
    await expect(prompt(p).textContent()).resolves.toMatch(/Look from the top hatch/);
    expect(await prompt(p).getAttribute("lang")).toBe("en");
    // The answers stay Spanish, and the next step (translated from its current English) is Spanish again.
    await answer(p, definition.states[first].on?.YES ? "Sí" : "Listo");
    await expect(prompt(p).textContent()).resolves.not.toMatch(/Look from the top hatch/);
    expect(await p.getByTestId("in-english").count()).toBe(0);
    await p.close();
  });

  it("the load card, its seed clock, the suction check and the rig cards speak Spanish too", async () => {
    await User.update({ language: "es" }, { where: { email: "sam@bluemesa.example" } });
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "sam@bluemesa.example");
    await p.goto(`${harness.app.url}/field-math/load?rig=BM-01`);
    await p.getByRole("heading", { name: "Tarjeta de carga" }).waitFor();
    await p.getByLabel("Área a cubrir").fill("1");
    await p
      .getByTestId("load-count")
      .filter({ hasText: /cargas? del tanque/ })
      .waitFor();
    await p
      .getByText(/^Agua hasta [\d,]+ gal \(la marca del 50 %\), con el agitador andando\.$/)
      .first()
      .waitFor();
    await p
      .getByText(/Arranca el reloj de la semilla: rocía antes de \d+ minutos\./)
      .first()
      .waitFor();
    await p.getByRole("button", { name: /^La semilla ya está adentro: arrancar el reloj de \d+ minutos$/ }).waitFor();
    // A bad figure is named in Spanish.
    await p.getByLabel("Tamaño del tanque").fill("lots");
    await p.getByText("Tamaño del tanque debe ser un número").waitFor();
    await p.goto(`${harness.app.url}/field-math/suction?rig=BM-01`);
    await p.getByLabel("Temperatura del agua").waitFor();
    await p.getByText("Llena cada cifra de este sitio para ver si la bomba va a mantener el cebado.").waitFor();
    await p.goto(`${harness.app.url}/rigs/BM-01/cards`);
    await p.getByRole("heading", { name: "Tarjetas del equipo · BM-01" }).waitFor();
    await p.getByRole("button", { name: /Revisión antes de arrancar/ }).waitFor();
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await p.close();
  });

  it("a person switches language on their account and the whole screen follows", async () => {
    const p = await harness.browser.context.newPage();
    await harness.browser.context.clearCookies();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    await p.goto(`${harness.app.url}/account`);
    await p.getByLabel("Español").check();
    await p.getByRole("button", { name: "Save language" }).click();
    await p.getByText("Guardado. Tankside ahora te habla en español.").waitFor();
    expect(await p.locator("html").getAttribute("lang")).toBe("es");
    await p.getByRole("heading", { name: "Idioma" }).waitFor();
    await p.goto(`${harness.app.url}/`);
    await p.getByRole("heading", { name: /^Hola Dana/ }).waitFor();
    await p.goto(`${harness.app.url}/account`);
    await p.getByLabel("English").check();
    await p.getByRole("button", { name: "Guardar idioma" }).click();
    await p.getByText("Saved. Tankside now speaks English to you.").waitFor();
    expect((await User.findOne({ where: { email: "dana@cedarflats.example" } }))!.language).toBe("en");
    await p.close();
  });
});
