/** Screen = world · k + (x, y). */
export interface View {
  readonly k: number;
  readonly x: number;
  readonly y: number;
}
