import { ApiError } from "@/lib/api/api-client.ts";
import { whenIdleAfterFirstScreen } from "@/lib/first-screen.ts";

/**
 * The device's outbox: every entry made at a visit that has not reached the server yet, in the
 * order it was made, each with the id the device gave it (the server stores an entry once per
 * id, however often it is sent) and the time it was taken. An entry the server refused stays,
 * with the reason, until the technician deals with it: nothing is dropped silently.
 */
export interface OutboxEntry {
  /** Made on the device at the first save; the server's key for storing the entry once. */
  clientId: string;
  /** Whose entry it is: only they send it or see it on this device. */
  userId: string;
  visitId: string;
  /** Which form made it: a refused entry goes back into that form. */
  kind: OutboxKind;
  /** What the technician sees in the lists, e.g. "Reading, circuit 1". */
  label: string;
  /** The write as it will be sent: POST to this API path with this JSON body (clientId included). */
  path: string;
  body: Record<string, unknown>;
  /** A photo's file: the entry is then sent as multipart form data, the body's fields beside it. */
  file?: OutboxFile;
  /** When the entry was taken (ISO), as the server will store it. */
  takenAt: string;
  /** Orders sending: entries leave in the order they were made. */
  queuedAt: number;
  state: "waiting" | "refused";
  /** The server's message and field messages for a refused entry. */
  reason?: string;
  fields?: Record<string, string>;
  attempts: number;
}

/** A file kept as a blob in IndexedDB until it is sent, with the form field and file name it goes under. */
export interface OutboxFile {
  field: string;
  blob: Blob;
  name: string;
}

export type OutboxKind =
  | "reading"
  | "adjustment"
  | "electrical-check"
  | "leak-search"
  | "standing-pressure-check"
  | "pressure-test"
  | "evacuation"
  | "evacuation-sample"
  | "photo"
  | "comment"
  | "refrigerant-movement"
  | "void";

/** How each kind of entry is named in the lists of entries on the device. */
export const OUTBOX_KIND_LABELS: Record<OutboxKind, string> = {
  reading: "Reading",
  adjustment: "Adjustment",
  "electrical-check": "Electrical check",
  "leak-search": "Leak search",
  "standing-pressure-check": "Standing-pressure check",
  "pressure-test": "Pressure test",
  evacuation: "Evacuation started",
  "evacuation-sample": "Evacuation reading",
  photo: "Photo",
  comment: "Comment",
  "refrigerant-movement": "Refrigerant movement",
  void: "Void",
};

/**
 * The outbox's database, opened on first use: dexie loads with it, in a chunk of its own, so the
 * sign-in screen and the first paint of the others do not wait for it (README decision 023).
 */
let opened: Promise<typeof import("./outbox-database.ts")> | undefined;
/** The longest the first watch of the outbox waits for the browser to be idle, ms. */
const OUTBOX_WATCH_WAIT_MS = 2_000;
const openOutbox = () => (opened ??= import("./outbox-database.ts"));

/** Keeps an entry to send later (again under the same id, if it was already kept). */
export async function keepInOutbox(entry: Omit<OutboxEntry, "queuedAt" | "state" | "attempts">): Promise<void> {
  const { outbox } = await openOutbox();
  const kept = await outbox.entries.get(entry.clientId);
  await outbox.entries.put({
    ...entry,
    queuedAt: kept?.queuedAt ?? Date.now(),
    state: "waiting",
    attempts: kept?.attempts ?? 0,
  });
}

/** A person's entries in the order they were made. */
export async function entriesOf(userId: string): Promise<OutboxEntry[]> {
  const { entriesOf: read } = await openOutbox();
  return read(userId);
}

/**
 * Watches a person's entries: `onChange` gets them now and after every change to the outbox,
 * from any tab. Returns the function that stops watching.
 */
export function watchEntries(userId: string, onChange: (entries: OutboxEntry[]) => void): () => void {
  let stop: (() => void) | undefined;
  let stopped = false;
  const start = () =>
    void openOutbox().then(
      ({ liveQuery, entriesOf: read }) => {
        if (stopped) return;
        const subscription = liveQuery(() => read(userId)).subscribe({ next: onChange, error: () => onChange([]) });
        stop = () => subscription.unsubscribe();
      },
      () => onChange([]),
    );
  // Once the first screen is drawn with its data (dexie is 28 kB brotli) and the browser is idle,
  // unless the outbox is open already (an entry was kept meanwhile).
  let cancel = () => undefined as void;
  if (opened) start();
  else cancel = whenIdleAfterFirstScreen(start, OUTBOX_WATCH_WAIT_MS);
  return () => {
    stopped = true;
    cancel();
    stop?.();
  };
}

/** Takes an entry off the device: it reached the server, or the technician discarded it. */
export async function discardEntry(clientId: string): Promise<void> {
  const { outbox } = await openOutbox();
  await outbox.entries.delete(clientId);
}

/** The server refused the entry: it stays, refused, with the reason and the field messages. */
export async function markRefused(entry: OutboxEntry, reason: string, fields: Record<string, string>): Promise<void> {
  const { outbox } = await openOutbox();
  await outbox.entries.update(entry.clientId, { state: "refused", reason, fields, attempts: entry.attempts + 1 });
}

/** A try that did not reach the server: the entry waits for the next. */
export async function countAttempt(entry: OutboxEntry): Promise<void> {
  const { outbox } = await openOutbox();
  await outbox.entries.update(entry.clientId, { attempts: entry.attempts + 1 });
}

/**
 * Sends a visit entry now; without a connection, or without an answer in time, keeps it in the
 * outbox under its client id instead (the server stores it once even if this try reached it).
 * Offline it is kept at once, without trying. Any other failure is the caller's to show.
 *
 * @returns "stored" with the server's answer, or "kept" when it waits on the device
 */
export async function sendOrKeep<T>(
  send: () => Promise<T>,
  entry: Omit<OutboxEntry, "queuedAt" | "state" | "attempts">,
): Promise<{ outcome: "stored"; stored: T } | { outcome: "kept" }> {
  if (navigator.onLine) {
    try {
      return { outcome: "stored", stored: await send() };
    } catch (error) {
      if (!(error instanceof ApiError && error.status === 0)) throw error;
    }
  }
  try {
    await keepInOutbox(entry);
  } catch {
    throw new ApiError(
      0,
      "No connection, and this device could not keep the entry: nothing was saved. Your values are kept here; save again when the signal is back.",
    );
  }
  return { outcome: "kept" };
}
