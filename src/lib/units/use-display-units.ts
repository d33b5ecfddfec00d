import { DEFAULT_PREFERENCES } from "@shared/schemas/profile.ts";
import { useProfile } from "@/lib/api/profile.ts";
import type { DisplayUnits } from "./display-units.ts";

/** The signed-in user's display units and default atmosphere; metric until the profile loads. */
export function useDisplayUnits(): { units: DisplayUnits; atmosphericKPa: number } {
  const profile = useProfile();
  const preferences = profile.data?.preferences ?? DEFAULT_PREFERENCES;
  return {
    units: { temperature: preferences.temperatureUnit, pressure: preferences.pressureUnit },
    atmosphericKPa: preferences.atmosphericPressureKPa,
  };
}
