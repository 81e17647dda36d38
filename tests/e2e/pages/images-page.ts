import { readFile } from "node:fs/promises";
import path from "node:path";
import { expect, type Locator, type Page } from "@playwright/test";

/** The photographs section of a source page, with its uploader. */
export class SourceImagesSection {
  constructor(private readonly page: Page) {}

  async open(sourceId: number) {
    await this.page.goto(`/sources/${sourceId}`);
    await expect(this.page.getByRole("heading", { name: "Photographs", exact: true })).toBeVisible();
  }

  get dropZone() {
    return this.page.getByTestId("image-drop-zone");
  }

  /** Drops files on the zone as a file manager would: a DataTransfer holding File objects. */
  async drop(files: string[]) {
    const payload = await Promise.all(files.map(async (f) => ({ name: path.basename(f), type: mimeOf(f), base64: (await readFile(f)).toString("base64") })));
    const dataTransfer = await this.page.evaluateHandle((items) => {
      const dt = new DataTransfer();
      for (const { name, type, base64 } of items) {
        const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
        dt.items.add(new File([bytes], name, { type }));
      }
      return dt;
    }, payload);
    await this.dropZone.dispatchEvent("dragenter", { dataTransfer });
    await this.dropZone.dispatchEvent("dragover", { dataTransfer });
    await this.dropZone.dispatchEvent("drop", { dataTransfer });
  }

  /** Picks files through the "Choose files" button and the browser's file dialog. */
  async choose(files: string[]) {
    const chooser = this.page.waitForEvent("filechooser");
    await this.dropZone.getByRole("button", { name: "Choose files" }).click();
    await (await chooser).setFiles(files);
  }

  /** The newest row for a file name in the list of uploads. */
  row(name: string): Locator {
    return this.page.getByRole("list", { name: "Uploads" }).getByTestId("upload-row").filter({ hasText: name }).last();
  }

  state(name: string): Locator {
    return this.row(name).getByTestId("upload-state");
  }

  get readyThumbnails(): Locator {
    return this.page.getByRole("list", { name: "Ready photographs" }).getByRole("listitem");
  }
}

/** The deep-zoom viewer page of one photograph. */
export class ImageViewerPage {
  constructor(private readonly page: Page) {}

  /** OpenSeadragon's focusable canvas (its overview map has a canvas of its own, without the role). */
  get canvas() {
    return this.page.getByRole("application");
  }

  button(name: string) {
    return this.page.getByRole("toolbar", { name: "Viewer controls" }).getByRole("button", { name, exact: true });
  }

  /** Waits for OpenSeadragon to open the photograph (the toolbar is enabled only then). */
  async waitUntilOpen() {
    await expect(this.button("Zoom in")).toBeEnabled({ timeout: 15_000 });
    await expect(this.page.getByTestId("zoom-level")).toHaveText(/\d %$/);
  }

  async zoomPercent(): Promise<number> {
    return Number.parseFloat((await this.page.getByTestId("zoom-level").textContent()) ?? "NaN");
  }

  /** The zoom once the animation has settled: two equal readings a little apart. */
  async settledZoom(): Promise<number> {
    let last = NaN;
    await expect
      .poll(
        async () => {
          const now = await this.zoomPercent();
          const same = now === last;
          last = now;
          return same;
        },
        { intervals: [300], timeout: 10_000 },
      )
      .toBe(true);
    return last;
  }

  rotation() {
    return this.page.getByTestId("rotation");
  }
}

function mimeOf(file: string): string {
  const ext = path.extname(file).toLowerCase();
  return { ".jpg": "image/jpeg", ".jpeg": "image/jpeg", ".png": "image/png", ".tif": "image/tiff", ".webp": "image/webp" }[ext] ?? "application/octet-stream";
}
