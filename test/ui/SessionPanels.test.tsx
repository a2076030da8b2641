import "./support/dom.ts";
import { act, fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { formatBytes } from "../../src/ui/panels/formatBytes.ts";
import { SessionNotice } from "../../src/ui/panels/SessionNotice.tsx";
import { SessionRestorePrompt } from "../../src/ui/panels/SessionRestorePrompt.tsx";

const sha = "0123456789abcdef".repeat(4); // a made-up fingerprint
const other = "fedcba9876543210".repeat(4);
const file = { name: "pumps.csv", bytes: 2_400_000, sha256: sha, isDemo: false };

describe("formatBytes", () => {
  it("812 bytes, 1 byte, 12.3 kB, 2.4 MB, 3.10 GB (decimal units, worked by hand)", () => {
    expect([812, 1, 12_345, 2_400_000, 3_100_000_000].map(formatBytes)).toEqual(["812 bytes", "1 byte", "12.3 kB", "2.4 MB", "3.10 GB"]);
  });
});

describe("SessionRestorePrompt", () => {
  it("shows nothing while no restore is under way", () => {
    const { container } = render(<SessionRestorePrompt />);
    expect(container.innerHTML).toBe("");
  });

  it("asks for the file by name, size and the first 12 hex digits of its fingerprint, with a file picker and 'Start afresh'", () => {
    act(() => workbenchStore.setState({ sessionRestore: { state: "needs-file", file } }));
    render(<SessionRestorePrompt />);
    expect(screen.getByTestId("session-restore").textContent).toContain("Open pumps.csv (2.4 MB, sha256 0123456789ab) to restore the session");
    expect(screen.getByRole("button", { name: "Open pumps.csv…" })).toBeTruthy();
    expect(screen.getByRole("button", { name: "Start afresh" })).toBeTruthy();
  });

  it("warns about another file with both whole fingerprints and offers to apply anyway", () => {
    act(() => workbenchStore.setState({ sessionRestore: { state: "other-file", file, foundSha256: other } }));
    render(<SessionRestorePrompt />);
    const alert = screen.getByRole("alert");
    expect(alert.textContent).toContain(sha);
    expect(alert.textContent).toContain(other);
    expect(screen.getByRole("button", { name: "Apply the session anyway" })).toBeTruthy();
  });
});

describe("SessionNotice", () => {
  it("says what is kept, where, and that nothing is sent; no keep-table box for the demo", () => {
    act(() => workbenchStore.setState({ source: { fileName: "pump-fleet.csv", fileSize: 300_000, isDemo: true }, kept: { session: true, tableBytes: null } }));
    render(<SessionNotice />);
    const text = screen.getByTestId("session-notice").textContent!;
    expect(text).toContain("IndexedDB");
    expect(text).toContain(window.location.origin);
    expect(text).toContain("Nothing is sent anywhere");
    expect(screen.queryByRole("checkbox")).toBeNull();
  });

  it("offers to keep a file's table with its size, unticked by default; Forget asks for confirmation first", () => {
    act(() => workbenchStore.setState({ source: { fileName: "pumps.csv", fileSize: 2_400_000, isDemo: false }, kept: { session: true, tableBytes: null } }));
    render(<SessionNotice />);
    const box = screen.getByRole("checkbox", { name: /Keep this table in this browser \(2\.4 MB\)/ }) as HTMLInputElement;
    expect(box.checked).toBe(false);
    fireEvent.click(screen.getByRole("button", { name: "Forget this session…" }));
    expect(screen.getByRole("group", { name: "confirm forgetting" }).textContent).toContain("Delete everything kept in this browser for this page?");
    fireEvent.click(screen.getByRole("button", { name: "Keep it" }));
    expect(screen.queryByRole("group", { name: "confirm forgetting" })).toBeNull();
  });
});
