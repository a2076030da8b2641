/** Above this many nodes the force layout and the node list would freeze the page; the graph is summarised instead (our choice, no source). */
export const maxDrawnNodes = 5000;

/** Edges laid out and drawn: the ones sharing the most rows; software rendering of tens of thousands of strokes takes seconds a frame (our measurement, npm run bench:browser). */
export const maxDrawnEdges = 4000;
