/** The link styles, for the `--link-style` flag. */
export const LINK_STYLES = ['relative', 'absolute', 'route-relative'];
