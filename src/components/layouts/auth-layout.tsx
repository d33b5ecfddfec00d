import { Outlet } from "react-router-dom";
import { SaturaMark } from "@/components/ui/satura-mark/satura-mark.tsx";
import { SunlightToggle } from "@/features/theme/components/sunlight-toggle.tsx";

/** The frame of the public account screens: no navigation, one narrow column that fits a phone. */
export function AuthLayout() {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="no-print flex items-center justify-between gap-2 px-4 py-3">
        <div className="flex items-center gap-2">
          <SaturaMark className="size-8" />
          <span className="text-xl font-semibold tracking-tight">Satura</span>
        </div>
        <SunlightToggle />
      </header>
      <main id="main" className="mx-auto w-full max-w-md flex-1 px-4 pb-10 pt-4">
        <Outlet />
      </main>
    </div>
  );
}
