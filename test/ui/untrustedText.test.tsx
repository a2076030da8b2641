import "./support/dom.ts";
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { ColorLegend } from "../../src/ui/graph/ColorLegend.tsx";
import { ColumnRoles } from "../../src/ui/panels/ColumnRoles.tsx";
import { NodeList } from "../../src/ui/panels/NodeList.tsx";
import { NodePane } from "../../src/ui/panels/NodePane.tsx";
import { TableReport } from "../../src/ui/panels/TableReport.tsx";

// Text from the table reaches the screen only as text: a column named like an HTML element with
// an event handler, and a label and category holding &, " and a letter, appear verbatim and no
// element is made from them.

const hostileName = "<img src=x onerror=alert(1)>";
const hostileLabel = 'a&b"c';
// The small table of test/ui/support/smallTable.ts without p5, its x column renamed, p2's id and two
// sites replaced by the label.
const hostileCsv = [
  `id,${hostileName},y,score,site`,
  "p1,1,2,10,north",
  `"a&b""c",2,1,20,"a&b""c"`,
  "p3,3,3,30,north",
  "p4,7,7,40,middle",
  `p6,11,12,50,"a&b""c"`,
  "p7,12,11,60,south",
  "p8,13,13,70,south",
  "",
].join("\n");

async function loadHostileTable(): Promise<void> {
  await act(async () => {
    await actions().loadText(hostileCsv, { fileName: "hostile.csv", fileSize: hostileCsv.length, isDemo: false }, { id: "id", outcomes: ["score"] });
    await actions().setRadius(1.4);
  });
}

function Workbench() {
  return (
    <>
      <TableReport />
      <ColumnRoles />
      <ColorLegend />
      <NodeList />
      <NodePane />
    </>
  );
}

it(`the column name ${hostileName} and the label ${hostileLabel} show verbatim in the report, columns, legend and node pane, and no img element exists`, async () => {
  const user = userEvent.setup();
  const { container } = render(<Workbench />);
  await loadHostileTable();

  const report = screen.getByTestId("table-report");
  expect(within(report).getByRole("rowheader", { name: hostileName })).toBeTruthy();
  expect(report.textContent).toContain(`p1, ${hostileLabel}, p3`); // first values of id
  expect(report.textContent).toContain(`north, ${hostileLabel}, north`); // first values of site
  expect(screen.getByRole("combobox", { name: `role of ${hostileName}` })).toBeTruthy();

  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), hostileName);
  expect(screen.getByText(`node mean of ${hostileName}`)).toBeTruthy();
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "site");
  expect(screen.getByRole("option", { name: `share of ${hostileLabel}` })).toBeTruthy();
  const levels = within(screen.getByTestId("legend")).getAllByRole("listitem").map((item) => item.textContent?.trim());
  expect(levels).toContain(hostileLabel);

  const list = screen.getByRole("listbox", { name: "nodes" });
  await user.selectOptions(list, within(list).getAllByRole("option")[1]!);
  const pane = screen.getByTestId("node-pane");
  expect(within(pane).getAllByRole("rowheader", { name: hostileName, hidden: true }).length).toBeGreaterThan(0);

  expect(container.textContent).toContain(hostileName);
  expect(container.querySelector("img")).toBeNull();
  expect(document.querySelector("img")).toBeNull();
});
