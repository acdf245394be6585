/** The site generators linkweave reads the config files of. */
export const PRESET_NAMES = ['mdbook', 'hugo', 'mkdocs', 'docusaurus', 'jekyll', 'vitepress'] as const;

/** One site generator's preset. */
export type PresetName = (typeof PRESET_NAMES)[number];
