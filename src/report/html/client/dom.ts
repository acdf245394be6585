/**
 * Small DOM helpers. Text from the report only ever reaches the page through `textContent`,
 * never as markup.
 */

/** An attribute value, or a value that leaves the attribute out (undefined, null, false). */
type Prop = string | number | boolean | null | undefined;

/** What `el` takes: text, class, event listeners, and attributes by name. */
export interface Props {
  readonly text?: Prop;
  readonly cls?: string | null;
  readonly on?: Readonly<Record<string, (ev: Event) => void>>;
  readonly [attribute: string]: Prop | Readonly<Record<string, (ev: Event) => void>>;
}

/** A child of `el`: an element, text, or nothing. */
export type Kid = Node | string | null | undefined;

/** Create an element: props.text sets textContent, props.cls the class, others are attributes. */
export function el<K extends keyof HTMLElementTagNameMap>(tag: K, props?: Props | null, kids?: readonly Kid[]): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (props) {
    for (const k of Object.keys(props)) {
      const v = props[k];
      if (v === undefined || v === null || v === false) continue;
      if (k === 'text') node.textContent = String(v);
      else if (k === 'cls') node.className = v as string;
      else if (k === 'on') { const on = v as Readonly<Record<string, (ev: Event) => void>>; for (const ev of Object.keys(on)) node.addEventListener(ev, on[ev]); }
      else node.setAttribute(k, v === true ? '' : String(v));
    }
  }
  if (kids) {
    for (const kid of kids) {
      if (kid === null || kid === undefined) continue;
      node.appendChild(typeof kid === 'string' ? document.createTextNode(kid) : kid);
    }
  }
  return node;
}

/** A code element holding the text. */
export function code(text: string): HTMLElement { return el('code', { text }); }

/** The element with this id; the page's markup (template.ts) always has it. */
export function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  return document.getElementById(id) as T;
}
