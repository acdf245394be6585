import type { RawLink } from '../types.js';
/**
 * Links of a navigation file, with context `template` and origin `navigation`, positioned in
 * the navigation file, in file order.
 * @param file the navigation file's path (relative to the content root), for messages and to
 *   choose YAML (`.yml`, `.yaml`) or Markdown
 * @param text its content
 * @throws EngineError `E_CONFIG_INVALID` naming the file and line when YAML does not parse
 *   (the file is named in the configuration; a broken one is a configuration error)
 */
export declare function parseNavigation(file: string, text: string): RawLink[];
