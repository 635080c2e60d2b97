/**
 * The `/` key that takes the keyboard to the page's search box, as people know it from
 * the tools they use every day. Not while typing: in a field, a text area, a choice list
 * or an editable region the key types a slash. Pure: the browser's event is read as data.
 */
export interface ShortcutKey {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  altKey: boolean;
  defaultPrevented: boolean;
}

export interface ShortcutTarget {
  tagName?: string;
  isContentEditable?: boolean;
}

const typingTags = new Set(["INPUT", "TEXTAREA", "SELECT"]);

/** True when the key press should move the focus to the search box. */
export function isSearchShortcut(
  event: ShortcutKey,
  target: ShortcutTarget | null,
): boolean {
  if (event.key !== "/" || event.defaultPrevented) return false;
  if (event.ctrlKey || event.metaKey || event.altKey) return false;
  if (target?.isContentEditable) return false;
  return !typingTags.has((target?.tagName ?? "").toUpperCase());
}
