/**
 * The display theme: the default warm-paper theme or Sunlight mode (high contrast, larger
 * type). Stored in localStorage so the choice survives reloads on a shared tablet, and
 * applied as data-theme on <html> so plain CSS variables switch every colour at once.
 */
export type Theme = "paper" | "sunlight";

export const THEME_STORAGE_KEY = "satura.theme";

const listeners = new Set<() => void>();

export function readTheme(): Theme {
  try {
    return localStorage.getItem(THEME_STORAGE_KEY) === "sunlight" ? "sunlight" : "paper";
  } catch {
    return "paper"; // storage blocked (private mode): fall back to the default theme
  }
}

export function applyTheme(theme: Theme): void {
  document.documentElement.dataset.theme = theme;
  document
    .querySelector('meta[name="theme-color"]')
    ?.setAttribute("content", theme === "sunlight" ? "#ffffff" : "#f4efe4");
}

export function setTheme(theme: Theme): void {
  try {
    localStorage.setItem(THEME_STORAGE_KEY, theme);
  } catch {
    // Not persisted, but still applied for this page.
  }
  applyTheme(theme);
  for (const listener of listeners) listener();
}

export function subscribeTheme(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (event: StorageEvent) => {
    if (event.key === THEME_STORAGE_KEY) {
      applyTheme(readTheme());
      listener();
    }
  };
  window.addEventListener("storage", onStorage); // another tab changed it
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", onStorage);
  };
}
