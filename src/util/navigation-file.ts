/** The navigation file's path as the outputs name it. */

/** Path of the navigation file as the report names it (relative posix path, no leading `./`); '' when there is none. */
export function navigationFile(options: { readonly navigation: string | null }): string {
  if (options.navigation === null) return '';
  return options.navigation.replace(/\\/g, '/').replace(/^(\.\/)+/, '');
}
