import { startFirstRequests } from "./lib/api/first-requests.ts";
import { startScreenImport } from "./routes/screens.ts";

// The entry chunk's first module (main.tsx imports it before anything else, and it imports
// neither React DOM nor the router): the first screen's scripts and data go out as soon as the
// entry chunk has arrived, not after the 0.25–0.35 s its other modules take to run on a slow phone.
if (navigator.onLine) startFirstRequests(window.location.pathname);
startScreenImport(window.location.pathname);
