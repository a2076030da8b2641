/** Shoal's version, as package.json says (a test holds the two in step); recipes name it in `writtenBy`. */
export const shoalVersion = "0.1.0";
