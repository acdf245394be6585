export { readPreset, configWithPreset } from './read.js';
export type { PresetRun } from './read.js';
export { detectGenerator, CONFIG_FILES } from './detect.js';
export type { Detection, FolderFiles } from './detect.js';
export { mergeConfig } from './merge.js';
export { PRESET_NAMES } from './names.js';
export type { PresetName } from './names.js';
export type { PresetSite, PresetNavigation, PresetRedirect, SiteFiles } from './types.js';
export { staticValue, literalAt, stripComments } from './static-js.js';
