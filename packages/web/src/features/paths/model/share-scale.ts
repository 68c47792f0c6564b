/** The share scale lives with the plan model, so the server's PDFs draw the same colours. */
export { SHARE_EDGES, SHARE_LEGEND, shareBin, shareColour, sharePercent as pct } from "@hushmark/floorplan";
