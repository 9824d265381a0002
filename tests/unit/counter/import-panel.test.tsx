// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { ImportPanel } from "@/components/counter/import-panel";
import { catalogCsv, catalogLines, csvFile } from "./import-csv-fixtures";

/** Stands in for the browser's XMLHttpRequest so a test decides how the upload goes. */
class FakeRequest {
  static last: FakeRequest | null = null;
  upload: { onprogress: ((event: Partial<ProgressEvent>) => void) | null; onload: (() => void) | null } = { onprogress: null, onload: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  status = 0;
  responseText = "";
  url = "";
  body: FormData | null = null;
  open(_method: string, url: string) {
    this.url = url;
  }
  send(body: FormData) {
    this.body = body;
    FakeRequest.last = this;
  }
  answer(status: number, body: unknown) {
    this.status = status;
    this.responseText = JSON.stringify(body);
    this.onload?.();
  }
}

beforeEach(() => {
  FakeRequest.last = null;
  vi.stubGlobal("XMLHttpRequest", FakeRequest);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function choose(file: File) {
  fireEvent.change(screen.getByLabelText(/choose a file/), { target: { files: [file] } });
}

const request = () => {
  if (!FakeRequest.last) throw new Error("nothing was sent");
  return FakeRequest.last;
};

describe("the import panel", () => {
  it("refuses a file that is not a CSV at once, with what to do", () => {
    render(<ImportPanel lines={catalogLines} />);
    choose(new File(["a"], "stock.xlsx", { type: "application/octet-stream" }));
    expect(screen.getByRole("alert").textContent).toMatch(/"stock.xlsx" is a spreadsheet workbook, not a CSV file/);
    expect(screen.getByLabelText(/choose a file/).getAttribute("aria-invalid")).toBe("true");
    expect(screen.queryByRole("progressbar")).toBeNull();
  });

  it("shows the reading progress, then the preview with counts, first rows and problems", async () => {
    render(<ImportPanel lines={catalogLines} />);
    choose(csvFile(catalogCsv(40, { badLines: [3] })));
    expect(screen.getByRole("progressbar", { name: "Reading and checking stock.csv" })).toBeTruthy();
    await screen.findByText("40 rows read and checked · 100 %");
    expect((screen.getByRole("progressbar", { name: /Reading/ }) as HTMLProgressElement).value).toBe(1);
    const counts = screen.getAllByRole("definition").map((cell) => cell.textContent);
    expect(counts).toEqual(["40", "39", "1"]);
    const preview = screen.getByRole("table", { name: "First 10 rows of the file" });
    expect(within(preview).getAllByRole("row")).toHaveLength(11);
    expect(within(preview).getByRole("columnheader", { name: "load_index" })).toBeTruthy();
    const problems = screen.getByRole("table", { name: "Problems found in the browser" });
    expect(within(problems).getAllByRole("row")[1]?.textContent).toMatch(/^3load_index.*999/);
  });

  it("uploads with the chosen mode, shows upload progress, blocks a second submit, then reports what was written", async () => {
    render(<ImportPanel lines={catalogLines} />);
    choose(csvFile(catalogCsv(12)));
    fireEvent.click(await screen.findByLabelText(/Import the valid rows only/));
    fireEvent.click(screen.getByRole("button", { name: "Import 12 rows" }));
    expect(request().url).toBe("/api/v1/catalog/import");
    expect(request().body?.get("mode")).toBe("valid-rows");
    expect((request().body?.get("file") as File).name).toBe("stock.csv");
    act(() => request().upload.onprogress?.({ lengthComputable: true, loaded: 40, total: 100 }));
    expect(screen.getByText("Sending the file… · 40 %")).toBeTruthy();
    const button = screen.getByRole("button", { name: "Importing…" }) as HTMLButtonElement;
    expect(button.disabled).toBe(true);
    act(() => request().upload.onload?.());
    expect(screen.getByText(/The server is checking and writing the rows/)).toBeTruthy();
    act(() => request().answer(200, { added: 10, updated: 2, unchanged: 0, refused: [], written: true }));
    const heading = await screen.findByRole("heading", { name: "Import report" });
    await waitFor(() => expect(document.activeElement).toBe(heading));
    expect(screen.getByText("Written: 10 rows added, 2 rows updated.")).toBeTruthy();
  });

  it("says plainly that nothing was written when rows were refused, and starts over on request", async () => {
    render(<ImportPanel lines={catalogLines} />);
    choose(csvFile(catalogCsv(5, { badLines: [4] })));
    const importButton = await screen.findByRole("button", { name: "Nothing will be written: 1 row is refused — fix it or choose 'import the valid rows'" });
    fireEvent.click(importButton);
    act(() =>
      request().answer(200, { added: 4, updated: 0, refused: [{ line: 4, column: "load_index", reason: "load index 999 is outside the published table" }], written: false }),
    );
    await screen.findByRole("heading", { name: "Import report" });
    expect(screen.getByText(/Nothing was written: 1 row was refused\. Fix them and upload again, or choose “Import the valid rows only”/)).toBeTruthy();
    expect(screen.getByText("Would be added").nextElementSibling?.textContent).toBe("4");
    const refused = screen.getByRole("table", { name: "Rows the server refused" });
    expect(within(refused).getAllByRole("row")[1]?.textContent).toBe("4load_indexload index 999 is outside the published table");
    fireEvent.click(screen.getByRole("button", { name: "Upload another file" }));
    await waitFor(() => expect(document.activeElement).toBe(screen.getByLabelText(/choose a file/)));
    expect(screen.queryByRole("heading", { name: "Import report" })).toBeNull();
  });

  it("says on the Import button what the chosen mode will write", async () => {
    render(<ImportPanel lines={catalogLines} />);
    choose(csvFile(catalogCsv(6, { badLines: [3, 5] })));
    await screen.findByRole("button", { name: "Nothing will be written: 2 rows are refused — fix them or choose 'import the valid rows'" });
    fireEvent.click(screen.getByLabelText(/Import the valid rows only/));
    expect(screen.getByRole("button", { name: "Import 4 rows, skip 2 refused" })).toBeTruthy();
  });

  it("shows the server's own message when it refuses the file", async () => {
    render(<ImportPanel lines={catalogLines} />);
    choose(csvFile(catalogCsv(2)));
    fireEvent.click(await screen.findByRole("button", { name: "Import 2 rows" }));
    act(() => request().answer(413, { error: { code: "too_large", message: "The file is over 5 MB." } }));
    await waitFor(() => expect(screen.getByText("The file is over 5 MB.")).toBeTruthy());
    expect((screen.getByRole("button", { name: "Import 2 rows" }) as HTMLButtonElement).disabled).toBe(false);
  });
});
