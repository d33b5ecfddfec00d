import { RefreshCw } from "lucide-react";
import { useEffect, useRef } from "react";
import { Button } from "@/components/ui/button/button.tsx";

interface StaleWriteNoticeProps {
  /** The server's 409 message: someone saved a newer version after this screen read it. */
  message: string;
  /** Fetches the latest version; the screen then shows it. */
  onReload: () => void;
  reloading?: boolean;
  /** What the person had typed, label and value, so nothing they wrote is lost on reload. */
  typed?: readonly (readonly [string, string])[];
}

/**
 * A save refused because the record changed meanwhile (409): says so, keeps what was typed in
 * view, and offers to load the latest version before trying again.
 */
export function StaleWriteNotice({ message, onReload, reloading = false, typed = [] }: StaleWriteNoticeProps) {
  const box = useRef<HTMLDivElement>(null);
  // On a phone the save button is far below: bring the notice into view when it appears.
  // Braces: newer browsers return a promise from scrollIntoView, and an effect may return only a cleanup.
  useEffect(() => {
    box.current?.scrollIntoView?.({ block: "nearest", behavior: "smooth" });
  }, []);
  return (
    <div ref={box} role="alert" className="space-y-3 rounded-card border-2 border-caution bg-surface p-3">
      <p className="font-medium">⚠ {message}</p>
      {typed.length > 0 && (
        <div>
          <p className="text-sm font-medium">What you had typed (not saved):</p>
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-4 text-sm">
            {typed.map(([label, value]) => (
              <div key={label} className="contents">
                <dt className="text-muted">{label}</dt>
                <dd className="num">{value === "" ? "(empty)" : value}</dd>
              </div>
            ))}
          </dl>
        </div>
      )}
      <Button variant="secondary" onClick={onReload} disabled={reloading}>
        <RefreshCw aria-hidden className="size-5" />{" "}
        {reloading ? "Loading the latest version…" : "Reload the latest version"}
      </Button>
    </div>
  );
}
