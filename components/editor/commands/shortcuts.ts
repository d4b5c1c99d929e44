/**
 * Keyboard shortcuts as plain strings ("Mod+Shift+Z", "ArrowLeft", "?"): matching a key event and
 * showing a shortcut to a person. `Mod` is ⌘ on a Mac and Ctrl elsewhere. Pure; never listens.
 */
export interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

interface Parsed {
  key: string;
  mod: boolean;
  shift: boolean;
  alt: boolean;
}

function parse(shortcut: string): Parsed {
  const parts = shortcut.split('+');
  const key = parts.pop() ?? '';
  return { key: key === 'Plus' ? '+' : key, mod: parts.includes('Mod'), shift: parts.includes('Shift'), alt: parts.includes('Alt') };
}

/** Keys whose shifted form is its own character ("?" is Shift+/): shift is implied, not required. */
const isSymbol = (key: string) => key.length === 1 && !/[a-z0-9]/i.test(key);

export function matchesShortcut(shortcut: string, e: KeyLike, isMac: boolean): boolean {
  const p = parse(shortcut);
  const mod = isMac ? e.metaKey : e.ctrlKey;
  if (p.mod !== mod) return false;
  if (p.alt !== e.altKey) return false;
  if (!isSymbol(p.key) && p.shift !== e.shiftKey) return false;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  const want = p.key.length === 1 ? p.key.toLowerCase() : p.key;
  return key === want;
}

const NAMES: Record<string, string> = {
  ArrowLeft: '←', ArrowRight: '→', ArrowUp: '↑', ArrowDown: '↓', Escape: 'Esc', Delete: 'Del', Backspace: '⌫', ' ': 'Space',
};

export function formatShortcut(shortcut: string, isMac: boolean): string {
  const p = parse(shortcut);
  const parts: string[] = [];
  if (p.mod) parts.push(isMac ? '⌘' : 'Ctrl');
  if (p.alt) parts.push(isMac ? '⌥' : 'Alt');
  if (p.shift) parts.push('Shift');
  parts.push(NAMES[p.key] ?? (p.key.length === 1 ? p.key.toUpperCase() : p.key));
  return parts.join(' ');
}

export function isMacPlatform(): boolean {
  return typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform || navigator.userAgent);
}
