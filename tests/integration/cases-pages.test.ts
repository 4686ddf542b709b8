import { randomUUID } from "node:crypto";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, CasePhoto, Company, GuideVersion, Rig, User } from "../../db/index";
import { action as photoAction } from "~/routes/api.cases.$id.photos";
import { loader as caseLoader } from "~/routes/cases.$id";
import { loader as photoLoader } from "~/routes/cases.$id.photos.$photoId";
import { loader as walkLoader } from "~/routes/cases.$id.walk";
import { action as fixAction, loader as fixLoader } from "~/routes/rigs.$code.fix";
import { loader as labelLoader } from "~/routes/rigs.$code.label";
import { resetDatabase } from "../helpers/db";
import { caseRow } from "../helpers/cases";
import { args, requestAs, run } from "../helpers/requests";

const DANA = "dana@cedarflats.example";
const SAM = "sam@bluemesa.example";
let caseId: string;

// A real JPEG's first bytes are enough for the type check; the rest is padding.
const jpegBytes = (size: number) => {
  const b = new Uint8Array(new ArrayBuffer(size));
  b.set([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01]);
  return b;
};
/** A small real JPEG as a phone writes it: EXIF with the phone's make, a GPS position and "rotate 90°". */
const phonePhoto = async () =>
  new Uint8Array(
    await sharp({ create: { width: 64, height: 48, channels: 3, background: "#c33" } })
      .jpeg()
      .withExif({ IFD0: { Make: "PhoneCo", Model: "Field 7" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "39/1 44/1 0/1" } })
      .withMetadata({ orientation: 6 })
      .toBuffer(),
  );
const upload = async (email: string, id: string, bytes: Uint8Array<ArrayBuffer>, name: string, phoneId?: string) => {
  const form = new FormData();
  form.set("stepId", "agitator-speed");
  if (phoneId !== undefined) form.set("phoneId", phoneId);
  form.set("photo", new File([bytes], name, { type: "image/jpeg" }));
  return run(async () => photoAction(args(await requestAs(email, `/api/cases/${id}/photos`, { method: "POST", body: form }), { id })));
};

beforeAll(async () => {
  await resetDatabase();
  const cedar = await Company.findOne({ where: { slug: "cedar-flats" } });
  const rig = await Rig.findOne({ where: { code: "CF-07" } });
  const dana = await User.findOne({ where: { email: DANA } });
  const version = await GuideVersion.findOne();
  caseId = randomUUID();
  await Case.create(caseRow({ id: caseId, companyId: cedar!.id, rigId: rig!.id, guideVersionId: version!.id, openedBy: dana!.id, openedAt: new Date() }));
});

describe("photos", () => {
  it("stores a JPEG under a key the server makes, and serves it to the company", async () => {
    const res = await upload(DANA, caseId, await phonePhoto(), "../../etc/passwd.jpg");
    expect(res.status).toBe(201);
    const photo = await CasePhoto.findByPk(res.data.id);
    expect(photo!.storageKey).toMatch(new RegExp(`^companies/\\d+/cases/${caseId}/[0-9a-f-]{36}\\.jpg$`));
    const served = (await photoLoader(args(await requestAs(DANA, "/x"), { id: caseId, photoId: String(res.data.id) }))) as Response;
    expect(served.headers.get("Content-Type")).toBe("image/jpeg");
    expect(new Uint8Array(await served.arrayBuffer()).slice(0, 3)).toEqual(new Uint8Array([0xff, 0xd8, 0xff]));
  });

  it("stores a photo resent by a phone (same phone id) once, and answers the first copy's id", async () => {
    const phoneId = randomUUID();
    const first = await upload(DANA, caseId, await phonePhoto(), "kept.jpg", phoneId);
    expect(first.status).toBe(201);
    const again = await upload(DANA, caseId, await phonePhoto(), "kept.jpg", phoneId);
    expect(again.status).toBe(200);
    expect(again.data.id).toBe(first.data.id);
    expect(await CasePhoto.count({ where: { caseId, phoneId } })).toBe(1);
    const before = await CasePhoto.count();
    const bad = await upload(DANA, caseId, await phonePhoto(), "kept.jpg", "not-a-uuid");
    expect(bad.status).toBe(400);
    expect(bad.data).toMatchObject({ error: "phoneId must be a UUID made by the phone.", fields: { phoneId: "not a UUID" } });
    expect(await CasePhoto.count()).toBe(before);
  });

  it("strips the phone's position and other metadata, keeping the picture upright", async () => {
    const taken = await phonePhoto();
    expect((await sharp(taken).metadata()).exif).toBeDefined();
    const res = await upload(DANA, caseId, taken, "IMG_0042.jpg");
    expect(res.status).toBe(201);
    const served = (await photoLoader(args(await requestAs(DANA, "/x"), { id: caseId, photoId: String(res.data.id) }))) as Response;
    expect(served.headers.get("Content-Disposition")).toMatch(/^inline; filename="case-[0-9a-f]{8}-photo-\d+\.jpeg"$/);
    expect(served.headers.get("Content-Security-Policy")).toMatch(/^sandbox;/);
    const stored = Buffer.from(await served.arrayBuffer());
    const meta = await sharp(stored).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
    expect(stored.includes(Buffer.from("PhoneCo"))).toBe(false);
    // Taken 64×48 with "rotate 90°" in its EXIF: stored upright as 48×64.
    expect([meta.width, meta.height]).toEqual([48, 64]);
  });

  it("refuses a damaged image that only starts like a JPEG, and saves nothing", async () => {
    const before = await CasePhoto.count();
    const res = await upload(DANA, caseId, jpegBytes(2048), "broken.jpg");
    expect(res.status).toBe(415);
    expect(await CasePhoto.count()).toBe(before);
  });

  it("refuses a text file renamed .jpg, and saves nothing", async () => {
    const before = await CasePhoto.count();
    const res = await upload(DANA, caseId, new TextEncoder().encode("just some notes, not a photo\n".repeat(20)), "notes.jpg");
    expect(res.status).toBe(415);
    expect(res.data.error).toMatch(/not a photo/);
    expect(await CasePhoto.count()).toBe(before);
  });

  it("refuses an 11 MB image with 413", async () => {
    const before = await CasePhoto.count();
    const res = await upload(DANA, caseId, jpegBytes(11 * 1024 * 1024), "huge.jpg");
    expect(res.status).toBe(413);
    expect(res.data.error).toMatch(/at most 10 MB/);
    expect(await CasePhoto.count()).toBe(before);
  });
});

describe("another company's ids answer 404 on every case page", () => {
  it.each([
    ["case page", () => caseLoader],
    ["walk-through", () => walkLoader],
  ])("%s", async (_name, loader) => {
    expect((await run(async () => loader()(args(await requestAs(SAM, `/cases/${caseId}`), { id: caseId })))).status).toBe(404);
    expect((await run(async () => loader()(args(await requestAs(DANA, `/cases/${caseId}`), { id: caseId })))).status).toBe(200);
  });

  it("photo upload and photo view", async () => {
    expect((await upload(SAM, caseId, jpegBytes(100), "x.jpg")).status).toBe(404);
    const photo = await CasePhoto.findOne();
    expect((await run(async () => photoLoader(args(await requestAs(SAM, "/x"), { id: caseId, photoId: String(photo!.id) })))).status).toBe(404);
  });

  it("start-a-fix and the rig label", async () => {
    for (const loader of [fixLoader, labelLoader]) {
      expect((await run(async () => loader(args(await requestAs(SAM, "/rigs/CF-07/fix"), { code: "CF-07" })))).status).toBe(404);
    }
    const start = await run(async () => fixAction(args(await requestAs(SAM, "/rigs/CF-07/fix", { form: { guideSlug: "foaming" } }), { code: "CF-07" })));
    expect(start.status).toBe(404);
  });
});

describe("rig label", () => {
  it("carries a QR code that opens start-a-fix for the rig", async () => {
    const res = await run(async () => labelLoader(args(await requestAs(DANA, "/rigs/CF-07/label"), { code: "CF-07" })));
    expect(res.data.url).toMatch(/\/rigs\/CF-07\/fix$/);
    expect(res.data.svg).toMatch(/^<svg/);
  });
});
