/**
 * A small input file for the end-to-end and export tests. Data records (0-based parsed rows):
 *   0 p1 x=0 · 1 p2 x=1 (its note holds a quoted newline) · 2 p3 x missing (dropped) ·
 *   3 p4 x=2 · 4 p5 x=3 (y missing) · 5 p6 x=5 · 6 =p7 x=6 (an id a spreadsheet would run as a formula)
 * A blank line sits between p2 and p3 and is not a record.
 * The used rows 0, 1, 3, 4, 5, 6 carry x = 0, 1, 2, 3, 5, 6: the hand-worked line of
 * test/core/graph/lineByHand.test.ts. Their mean is 17/6 and the squared deviations sum to
 * 75 − 6·(17/6)² = 161/6, so the sample sd is √(161/30) (worked by hand), and z-scoring divides
 * every distance by it: a raw radius ρ becomes ρ / √(161/30).
 */
export const lineCsv = 'id,x,y,note\np1,0,10,a\np2,1,20,"two\nlines"\n\np3,,30,gap\np4,2,40,b\np5,3,,c\np6,5,60,d\n=p7,6,70,e\n';

export const lineSd = Math.sqrt(161 / 30); // worked by hand, see above
