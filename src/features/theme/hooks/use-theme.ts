import { useSyncExternalStore } from "react";
import { readTheme, setTheme, subscribeTheme, type Theme } from "../theme-store.ts";

export function useTheme(): [Theme, (theme: Theme) => void] {
  const theme = useSyncExternalStore(subscribeTheme, readTheme, () => "paper" as const);
  return [theme, setTheme];
}
