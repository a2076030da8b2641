// The hand-worked case: six points on a line, x = 0, 1, 2, 3, 5, 6 (rows 0..5), one column,
// unscaled, Euclidean distance |x − y|, greedy net in file order. All distances are integers,
// so the ties d = r below are exact.
import { describe, expect, it } from "vitest";
import { ballMembership, components, euclidean, overlapEdges, rowsToNodes, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { allLists } from "../support/bruteForce.ts";

const line: NumericTable = Object.freeze({ rows: 6, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2, 3, 5, 6) });
const fileOrder = Uint32Array.of(0, 1, 2, 3, 4, 5);

describe("six points on a line with r = 1", () => {
  // Net: x=0 is first → landmark. x=1: |1−0| = 1 ≤ 1, covered (tie). x=2: |2−0| = 2 > 1 → landmark.
  // x=3: |3−2| = 1, covered (tie). x=5: 5 and 3 away from 0 and 2 → landmark. x=6: |6−5| = 1, covered.
  // Landmarks: rows 0, 2, 4 (x = 0, 2, 5).
  // Balls (closed): B(0) = {0, 1} → rows 0, 1; B(2) = {1, 2, 3} → rows 1, 2, 3; B(5) = {5, 6} → rows 4, 5
  // (x = 3 is 2 from 5). Shared rows: B(0) ∩ B(2) = {row 1}; B(2) ∩ B(5) = ∅; B(0) ∩ B(5) = ∅.
  // Graph: one edge 0–1 sharing 1 row; components {0, 1} and {2}.
  const landmarks = greedyNet(line, euclidean, 1, fileOrder);
  const members = ballMembership(line, euclidean, 1, landmarks);
  const rowNodes = rowsToNodes(members, line.rows);
  const edges = overlapEdges(rowNodes, landmarks.length);

  it("the landmarks are rows 0, 2, 4", () => {
    expect(Array.from(landmarks)).toEqual([0, 2, 4]); // worked by hand
  });

  it("the balls are rows {0, 1}, {1, 2, 3}, {4, 5}", () => {
    expect(Array.from(members.offsets)).toEqual([0, 2, 5, 7]); // worked by hand
    expect(allLists(members)).toEqual([[0, 1], [1, 2, 3], [4, 5]]); // worked by hand
  });

  it("row 1 lies in nodes 0 and 1, every other row in one node", () => {
    expect(allLists(rowNodes)).toEqual([[0], [0, 1], [1], [1], [2], [2]]); // worked by hand
  });

  it("there is one edge, 0–1, sharing 1 row", () => {
    expect({ source: Array.from(edges.source), target: Array.from(edges.target), shared: Array.from(edges.shared) }).toEqual({
      source: [0], target: [1], shared: [1], // worked by hand
    });
  });

  it("there are two components: nodes 0 and 1 form component 0, node 2 component 1", () => {
    const result = components(landmarks.length, edges.source, edges.target);
    expect(Array.from(result.component)).toEqual([0, 0, 1]); // worked by hand
    expect(result.count).toBe(2); // worked by hand
  });
});

describe("six points on a line with r = 2", () => {
  // Net: x=0 → landmark; x=1, x=2 within 2 of 0 (x=2 a tie); x=3 is 3 from 0 → landmark;
  // x=5 is 2 from 3, covered (tie); x=6 is 6 and 3 away → landmark. Landmarks: rows 0, 3, 5 (x = 0, 3, 6).
  // Balls: B(0) = {0, 1, 2} → rows 0, 1, 2; B(3) = {1, 2, 3, 5} → rows 1, 2, 3, 4; B(6) = {5, 6} → rows 4, 5.
  // Shared: B(0) ∩ B(3) = rows {1, 2} (2 rows); B(3) ∩ B(6) = row {4} (1 row); B(0) ∩ B(6) = ∅.
  // Graph: a path 0 – 1 – 2; one component.
  const landmarks = greedyNet(line, euclidean, 2, fileOrder);
  const members = ballMembership(line, euclidean, 2, landmarks);
  const edges = overlapEdges(rowsToNodes(members, line.rows), landmarks.length);

  it("the landmarks are rows 0, 3, 5", () => {
    expect(Array.from(landmarks)).toEqual([0, 3, 5]); // worked by hand
  });

  it("the balls are rows {0, 1, 2}, {1, 2, 3, 4}, {4, 5}", () => {
    expect(Array.from(members.offsets)).toEqual([0, 3, 7, 9]); // worked by hand
    expect(allLists(members)).toEqual([[0, 1, 2], [1, 2, 3, 4], [4, 5]]); // worked by hand
  });

  it("the edges are 0–1 sharing 2 rows and 1–2 sharing 1 row", () => {
    expect({ source: Array.from(edges.source), target: Array.from(edges.target), shared: Array.from(edges.shared) }).toEqual({
      source: [0, 1], target: [1, 2], shared: [2, 1], // worked by hand
    });
  });

  it("the graph is one component", () => {
    const result = components(landmarks.length, edges.source, edges.target);
    expect(Array.from(result.component)).toEqual([0, 0, 0]); // worked by hand
    expect(result.count).toBe(1); // worked by hand
  });
});

describe("six points on a line, visited in reverse file order with r = 1", () => {
  // Order 5, 4, ..., 0: x=6 → landmark; x=5 covered; x=3 is 3 from 6 → landmark; x=2 covered by 3;
  // x=1 is 2 from 3 → landmark; x=0 covered by 1. Landmarks in the order chosen: rows 5, 3, 1.
  // Balls: B(6) = rows {4, 5}; B(3) = {2, 3} → rows 2, 3 (x=5 is 2 away); B(1) = {0, 1, 2} → rows 0, 1, 2.
  // Shared: B(3) ∩ B(1) = row {2}. Edge 1–2 sharing 1 row; node 0 alone.
  const landmarks = greedyNet(line, euclidean, 1, Uint32Array.of(5, 4, 3, 2, 1, 0));
  const members = ballMembership(line, euclidean, 1, landmarks);
  const edges = overlapEdges(rowsToNodes(members, line.rows), landmarks.length);

  it("the landmarks are rows 5, 3, 1 in the order chosen, with balls {4, 5}, {2, 3}, {0, 1, 2}", () => {
    expect(Array.from(landmarks)).toEqual([5, 3, 1]); // worked by hand
    expect(allLists(members)).toEqual([[4, 5], [2, 3], [0, 1, 2]]); // worked by hand
  });

  it("the only edge is 1–2 sharing 1 row, and node 0 is its own component", () => {
    expect([Array.from(edges.source), Array.from(edges.target), Array.from(edges.shared)]).toEqual([[1], [2], [1]]); // worked by hand
    const result = components(landmarks.length, edges.source, edges.target);
    expect(Array.from(result.component)).toEqual([0, 1, 1]); // worked by hand
  });
});
