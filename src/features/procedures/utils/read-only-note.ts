/**
 * What a visit's sections say to someone whose role reads but does not record. Its own module:
 * the visit screen reads it on its first load, and the procedures' frame, which brings the void
 * dialogs and react-hook-form with it, is not part of that load.
 */
export const ROLE_READ_ONLY_NOTE = "You can read this visit; recording is for technicians, seniors and owners.";
