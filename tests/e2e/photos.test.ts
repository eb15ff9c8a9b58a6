import sharp from "sharp";
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GPS_EXIF, noisyJpeg } from "../fixtures/images";
import { axeAtEachWidth, describeFindings, isFailing } from "./axe";
import { SCREENSHOT_DIR, launchBrowser, newPage, screenshot, signIn } from "./browser";

type ApiPhoto = { id: string; caption: string | null; url: string; thumbUrl: string };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

async function openDemoPress(page: Page): Promise<string> {
  await page.goto("/presses");
  await page.getByRole("link", { name: "Bay 1 H-frame" }).click();
  await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
  return page.url();
}

/** Waits until the image has actually been decoded (served through next/image from the file host). */
async function expectLoaded(page: Page, image: Locator): Promise<void> {
  await image.waitFor();
  await page.waitForFunction((el) => el instanceof HTMLImageElement && el.complete && el.naturalWidth > 0, await image.elementHandle(), { timeout: 15_000 });
}

describe("photos", () => {
  // Upload, two views, link expiry and an axe run at two widths: more than the default minute on a busy machine.
  it("a manager attaches a GPS-tagged photo to a press, sees its thumbnail, and another shop gets 404", async () => {
    const caption = `Gusset weld, left upright ${Date.now().toString(36)}`;
    const { context, page } = await newPage(browser);
    await signIn(page, "dana@millrace-forge.example");
    const pressUrl = await openDemoPress(page);
    const pressId = new URL(pressUrl).pathname.split("/").at(-1)!;

    const uploader = page.getByRole("region", { name: "Add photos" });
    await uploader.getByLabel("Shows").selectOption("weld");
    await uploader.getByLabel("Caption (optional)").fill(caption);
    await page.getByLabel("Choose photos").setInputFiles({ name: "IMG_2041.jpg", mimeType: "image/jpeg", buffer: await noisyJpeg(1600, 1200, GPS_EXIF) });
    await uploader.getByRole("button", { name: "Upload photo" }).click();
    await page.getByText("1 photo added.").waitFor({ timeout: 30_000 });
    await expectLoaded(page, page.getByTestId("photo-gallery").getByAltText(caption));
    await page.locator("#photos").scrollIntoViewIfNeeded();
    await screenshot(page, "photos-press-1280");

    // The stored image carries no location (or any other) metadata.
    const { photos } = (await (await page.request.get(`/api/presses/${pressId}/photos?kind=weld`)).json()) as { photos: ApiPhoto[] };
    const photo = photos.find((p) => p.caption === caption)!;
    expect(photo).toBeDefined();
    // Photos are private: the file comes through the app's session-checked link.
    const stored = await sharp(Buffer.from(await (await page.request.get(photo.url)).body())).metadata();
    expect([stored.format, stored.width, stored.exif, stored.xmp, stored.iptc]).toEqual(["jpeg", 1600, undefined, undefined, undefined]);

    await page.getByRole("button", { name: `Open photo: ${caption}` }).click();
    const dialog = page.getByRole("dialog");
    await dialog.waitFor();
    await expectLoaded(page, dialog.getByAltText(caption));
    await page.screenshot({ path: `${SCREENSHOT_DIR}photos-viewer-1280.png` });
    // The viewer dialog at a phone's and a desk's width: no serious or critical axe finding.
    const viewer = await axeAtEachWidth(page, "press page, photo viewer open", () => dialog.waitFor());
    expect(describeFindings(viewer.filter(isFailing))).toEqual([]);
    await page.setViewportSize({ width: 1280, height: 800 });
    await dialog.getByRole("button", { name: "Close" }).click();

    // A member of another shop: the photo's API and the press page are 404 for them.
    const other = await newPage(browser, 390, 844);
    await signIn(other.page, "lena@garage-build.example");
    expect((await other.page.request.get(`/api/photos/${photo.id}`)).status()).toBe(404);
    expect((await other.page.request.get(`/api/presses/${pressId}/photos`)).status()).toBe(404);
    const foreignPage = await other.page.goto(pressUrl);
    expect(foreignPage?.status()).toBe(404);
    await other.context.close();

    // Phone width, then the manager deletes it again and its files go with it.
    const phone = await newPage(browser, 390, 844);
    await signIn(phone.page, "dana@millrace-forge.example");
    await phone.page.goto(`${pressUrl}#photos`);
    await expectLoaded(phone.page, phone.page.getByTestId("photo-gallery").getByAltText(caption));
    await phone.page.locator("#photos").scrollIntoViewIfNeeded();
    await screenshot(phone.page, "photos-press-390");
    await phone.page.getByRole("button", { name: `Open photo: ${caption}` }).click();
    await expectLoaded(phone.page, phone.page.getByRole("dialog").getByAltText(caption));
    await phone.page.screenshot({ path: `${SCREENSHOT_DIR}photos-viewer-390.png` });
    await phone.context.close();

    await page.getByRole("button", { name: `Open photo: ${caption}` }).click();
    await dialog.getByRole("button", { name: "Delete…" }).click();
    await dialog.getByRole("button", { name: "Delete photo" }).click();
    await dialog.waitFor({ state: "hidden" });
    await page.getByRole("button", { name: `Open photo: ${caption}` }).waitFor({ state: "detached" });
    // Gone (404), or its short test-server link has already expired (410): never served again.
    expect([404, 410]).toContain((await page.request.get(photo.url)).status());
    expect((await page.request.get(`/api/photos/${photo.id}`)).status()).toBe(404);
    await context.close();
  }, 150_000);

  it("tells the uploader at once when a file is not a photo it can take", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await signIn(page, "dana@millrace-forge.example");
    await openDemoPress(page);
    await page.getByLabel("Choose photos").setInputFiles({ name: "notes.txt", mimeType: "text/plain", buffer: Buffer.from("torque 45 Nm") });
    await page.getByText("notes.txt is not a JPEG, PNG or WebP photo.", { exact: false }).waitFor();
    expect(await page.getByRole("button", { name: "Upload photo" }).isDisabled()).toBe(true);
    await context.close();
  });
});
