/**
 * The pane's only way of making DOM: elements with attributes and text, where text always
 * goes in through textContent. Headers, sheet names and every other string that came from
 * cells are therefore shown as text, never parsed as HTML.
 */

/** Attributes of an element; `false`, null and undefined leave the attribute off. */
export type Attributes = Record<string, string | number | boolean | null | undefined>;

/** A child: an element, or text (inserted as a text node). */
export type Child = Node | string | null | undefined | false;

/** Makes an element with attributes and children; strings become text nodes. */
export function el<K extends keyof HTMLElementTagNameMap>(tag: K, attributes?: Attributes, ...children: Child[]): HTMLElementTagNameMap[K];
export function el(tag: string, attributes?: Attributes, ...children: Child[]): HTMLElement;
export function el(tag: string, attributes: Attributes = {}, ...children: Child[]): HTMLElement {
  const node = document.createElement(tag);
  for (const [name, value] of Object.entries(attributes)) {
    if (value === false || value === null || value === undefined) continue;
    node.setAttribute(name, value === true ? '' : String(value));
  }
  append(node, ...children);
  return node;
}

/** Appends children; strings become text nodes. */
export function append(parent: Node, ...children: Child[]): void {
  for (const child of children) {
    if (child === null || child === undefined || child === false) continue;
    parent.appendChild(typeof child === 'string' ? document.createTextNode(child) : child);
  }
}

/** Removes every child of a node. */
export function clear(node: Node): void {
  while (node.firstChild) node.removeChild(node.firstChild);
}
