import { loadAllRefrigerants } from "@shared/engine/index.ts";

// Tests judge any refrigerant synchronously, as the server does after its start-up load; a screen
// loads only the refrigerant it shows (loadRefrigerant in its route loader).
await loadAllRefrigerants();
