/** How nodes are filled in a picture: a number per node (sequential scale), a level per node (−1 none), or nothing (null). */
export type PictureFill =
  | { readonly kind: "sequential"; readonly values: Float64Array; readonly caption: string }
  | { readonly kind: "categorical"; readonly level: Int32Array; readonly levels: readonly string[]; readonly caption: string }
  | null;

/** What the caption says about the build, so a reader can make the same graph again. */
export interface PictureFacts {
  readonly fileName: string;
  /** Feature columns as used (a one-hot column may carry a note such as "(one-hot)"). */
  readonly features: readonly string[];
  readonly scale: string;
  readonly metric: string;
  readonly radius: number;
  readonly landmarks: string;
  readonly seed: number;
  readonly nodeCount: number;
  readonly edgeCount: number;
  /** The colour column's name, or null when nodes are not coloured. */
  readonly colourBy: string | null;
}

/** Everything a picture shows; positions are in layout units, fitted to the frame by the picture. */
export interface PictureInput {
  /** Size of the picture in CSS pixels (SVG user units). */
  readonly width: number;
  readonly height: number;
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
  readonly radius: ArrayLike<number>;
  /** The edges drawn (0-based node numbers and shared rows); may be fewer than `facts.edgeCount`. */
  readonly edges: { readonly source: ArrayLike<number>; readonly target: ArrayLike<number>; readonly shared: ArrayLike<number> };
  readonly fill: PictureFill;
  /** Regions in list order (the place sets the outline style): a name and the nodes outlined. */
  readonly outlines: readonly { readonly name: string; readonly nodes: readonly number[] }[];
  /** Greyscale-safe form: categories by numbered grey steps, outlines by dash pattern, a monotone lightness ramp. */
  readonly greyscale: boolean;
  readonly facts: PictureFacts;
}
