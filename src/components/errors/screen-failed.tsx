import { Link } from "react-router-dom";
import { Button } from "@/components/ui/button/button.tsx";

/**
 * What a screen shows when its data could not be had (ScreenBoundary's `failed`): the screen's
 * own heading, the server's or the network's words, a way to ask again (the signal on a roof
 * comes and goes) and a way back to the list it was opened from.
 */
export function ScreenFailed({
  title,
  error,
  retry,
  back,
}: {
  title: string;
  error: Error;
  retry: () => void;
  back: { to: string; label: string };
}) {
  return (
    <div role="alert" className="space-y-3">
      <h1 className="text-2xl font-semibold">{title}</h1>
      <p>{error.message}</p>
      <div className="flex flex-wrap items-center gap-4">
        <Button variant="secondary" onClick={retry}>
          Try again
        </Button>
        <Link to={back.to} className="font-medium text-accent underline underline-offset-4">
          {back.label}
        </Link>
      </div>
    </div>
  );
}
