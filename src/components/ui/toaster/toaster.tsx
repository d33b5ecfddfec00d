import { useEffect, useSyncExternalStore } from "react";
import { whenIdleAfterFirstScreen } from "@/lib/first-screen.ts";

/**
 * Error toasts, with the toast library (sonner) kept off the first load: it was 9 kB of every
 * first page, the sign-in screen's included. The signed-in frame fetches it once the browser is
 * idle after the first screen (fetchToastLibraryWhenIdle), so that it is already held when the
 * first toast comes, which is often the moment the connection has gone ("No connection"); a
 * public screen (sign-in, a mailed link), whose errors show in its form, fetches it for its first
 * toast only. If it still cannot be fetched, the messages show in a plain alert list instead and
 * the next toast tries again: a toast must never take the page down with it.
 */
type Sonner = typeof import("sonner");

let sonner: Sonner | null = null;
/** Set once sonner's Toaster is mounted and listening; toasts before that wait in `pending`. */
let mounted = false;
let loading: Promise<void> | null = null;
/** Messages raised while the library is not mounted yet, or could not be fetched. */
let pending: readonly string[] = [];
const listeners = new Set<() => void>();

function notify() {
  for (const listener of listeners) listener();
}

/** Fetches the library once; a failed fetch (offline) is forgotten, so the next call tries again. */
function fetchSonner(): void {
  loading ??= import("sonner").then(
    (library) => {
      sonner ??= library;
      notify();
    },
    () => {
      loading = null; // shown as plain alerts meanwhile
      notify();
    },
  );
}

/** Shows an error toast; the library is fetched now if the idle-time fetch has not run yet. */
export function toastError(message: string): void {
  if (sonner && mounted) {
    sonner.toast.error(message);
    return;
  }
  pending = [...pending, message];
  notify();
  fetchSonner();
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

interface ToasterState {
  library: Sonner | null;
  pending: readonly string[];
}
let snapshot: ToasterState = { library: null, pending };
function getSnapshot(): ToasterState {
  if (snapshot.library !== sonner || snapshot.pending !== pending) snapshot = { library: sonner, pending };
  return snapshot;
}

function LoadedToaster({ library }: { library: Sonner }) {
  // Runs after sonner's own Toaster has subscribed (a child's effects run first): a Toaster
  // shows only toasts raised after it subscribed.
  useEffect(() => {
    mounted = true;
    const waiting = pending;
    pending = [];
    for (const message of waiting) library.toast.error(message);
    notify();
    return () => {
      mounted = false;
    };
  }, [library]);
  return (
    <library.Toaster position="top-center" richColors closeButton toastOptions={{ style: { fontSize: "1rem" } }} />
  );
}

/** Shown only when the toast library could not be fetched (offline before it was ever held). */
function PlainToasts({ messages }: { messages: readonly string[] }) {
  if (messages.length === 0) return null;
  return (
    <div role="alert" className="fixed inset-x-2 top-2 z-50 mx-auto max-w-md space-y-2">
      {messages.map((message, index) => (
        <p key={index} className="rounded-card border-2 border-rule bg-surface p-3 shadow-card">
          {message}
        </p>
      ))}
      <button
        type="button"
        className="min-h-touch rounded-card border-2 border-rule bg-surface px-4 font-medium"
        onClick={() => {
          pending = [];
          notify();
        }}
      >
        Dismiss
      </button>
    </div>
  );
}

/** Fetches the toast library once the browser is idle; returns the cancel for an effect's clean-up. */
export function fetchToastLibraryWhenIdle(): () => void {
  // After the first screen is drawn with its data: on a slow link, not between its requests.
  return whenIdleAfterFirstScreen(fetchSonner, 5000);
}

/** Where toasts appear. */
export function Toaster() {
  const state = useSyncExternalStore(subscribe, getSnapshot);
  if (state.library) return <LoadedToaster library={state.library} />;
  return <PlainToasts messages={state.pending} />;
}
