import type { Page } from "playwright-core";

export interface FileToPick {
  name: string;
  mimeType: string;
  buffer: Buffer;
}

/** Page object for the attachments section of the Planner and of the review page. */
export class AttachmentsSection {
  constructor(readonly page: Page) {}

  get root() {
    return this.page.getByTestId("attachments");
  }

  /** Picks files as the file chooser would (the drop zone takes the same list). */
  async pick(files: FileToPick[]): Promise<void> {
    await this.root.getByTestId("attachment-input").setInputFiles(files);
  }

  uploadRow(name: string) {
    return this.root.getByTestId("upload-row").filter({ hasText: name });
  }

  tile(name: string) {
    return this.root.getByTestId("attachment").filter({ has: this.page.getByTestId("attachment-name").getByText(name, { exact: true }) });
  }

  /** Until the tile's thumbnail has been fetched and decoded by the browser. */
  async waitForThumbnail(name: string): Promise<{ naturalWidth: number; src: string }> {
    const image = this.tile(name).getByTestId("attachment-thumbnail");
    await image.waitFor();
    await image.evaluate((img: HTMLImageElement) =>
      img.complete && img.naturalWidth > 0 ? undefined : new Promise((resolve) => img.addEventListener("load", resolve, { once: true })),
    );
    return image.evaluate((img: HTMLImageElement) => ({ naturalWidth: img.naturalWidth, src: img.getAttribute("src") ?? "" }));
  }

  async names(): Promise<string[]> {
    return this.root.getByTestId("attachment-name").allInnerTexts();
  }
}
