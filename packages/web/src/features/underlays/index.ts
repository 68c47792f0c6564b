/** Drawings to trace over in the Sketch: the menu, the two-click steps over the canvas, and the upload API. */
export { UnderlayMenu } from "./components/underlay-menu";
export { UnderlayPicker } from "./components/underlay-picker";
export { useUnderlayUi } from "./model/underlay-ui";
export { useUnderlaySrc, underlayImageUrl } from "./api/underlays";
