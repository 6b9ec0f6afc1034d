// The studio's view half (issue 4): draw and animate a SolveResult from lib/track.
export { StudioCanvas, type StudioCanvasProps, type CanvasHighlight } from "./studio-canvas";
export { PlayControls, type PlayControlsProps } from "./play-controls";
export { useRollingClock, stepFrame, SPEEDS, CYCLE_SECONDS, type RollingClock } from "./use-rolling-clock";
export { CheckPanel, type CheckPanelProps } from "./check-panel";
export { checkFigures, FRICTION_GUIDE, type Figure } from "./check-figures";
export { CheckPlots, plotsFor } from "./check-plots";
export { OptionsTable, type OptionsTableProps } from "./options-table";
export { StudioView, type StudioViewProps } from "./studio-view";
export type { StudioProbe } from "./studio-probe";
