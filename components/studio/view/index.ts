// The studio's view half: draw and animate a solved design from lib/track, with its checks beside it.
export { PlayControls } from "./play-controls";
export { CheckPanel } from "./check-panel";
export { checkFigures } from "./check-figures";
export { CheckPlots } from "./check-plots";
export { OptionsTable } from "./options-table";
export { StudioView } from "./studio-view";
