import { Camera, CloudOff, Images } from "lucide-react";
import { useEffect, useRef, useState } from "react";
import { PHOTO_KINDS, type Visit } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { photosPath, useUploadPhoto } from "@/lib/api/visits.ts";
import type { OutboxEntry } from "@/features/offline/outbox-store.ts";
import { useKeepWhenOffline, useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";

const KIND_LABELS: Record<(typeof PHOTO_KINDS)[number], string> = {
  nameplate: "Nameplate",
  gauges: "Gauges",
  damage: "Damage",
  repair: "Repair",
  other: "Other",
};

/**
 * Photos of the nameplate, gauges and damage. Two ways in: the camera straight away (capture), or
 * the gallery for a photo taken earlier, e.g. before signal came back; one capture input alone
 * makes some phones skip the gallery.
 */
export function PhotosPanel({ visit, canUpload }: { visit: Visit; canUpload: boolean }) {
  const upload = useUploadPhoto();
  const keepWhenOffline = useKeepWhenOffline();
  const onDevice = useOutboxEntries().filter((entry) => entry.visitId === visit.id && entry.kind === "photo");
  const [kind, setKind] = useState<(typeof PHOTO_KINDS)[number]>("gauges");
  const [error, setError] = useState<string | null>(null);
  const [kept, setKept] = useState(false);
  const cameraInput = useRef<HTMLInputElement>(null);
  const galleryInput = useRef<HTMLInputElement>(null);

  const send = async (file: File | undefined) => {
    if (!file) return;
    setError(null);
    setKept(false);
    // Its own id and the time it was added: without signal the photo waits on the device as a
    // blob and is sent later, stored once, with this time (README decisions 026, 027).
    const fields = { kind, clientId: crypto.randomUUID(), takenAt: new Date().toISOString() };
    try {
      const sent = await keepWhenOffline(() => upload.mutateAsync({ visitId: visit.id, file, ...fields }), {
        kind: "photo",
        visitId: visit.id,
        label: `${KIND_LABELS[kind]} photo`,
        path: photosPath(visit.id),
        body: fields,
        file: { field: "photo", blob: file, name: file.name },
      });
      setKept(sent.outcome === "kept");
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The photo was not uploaded");
    } finally {
      // Cleared, so choosing the same file again still uploads it.
      for (const input of [cameraInput.current, galleryInput.current]) if (input) input.value = "";
    }
  };

  return (
    <section aria-labelledby="photos-heading" className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 id="photos-heading" className="flex items-center gap-2 text-lg font-semibold">
        <Camera aria-hidden className="size-5" /> Photos
      </h2>
      {visit.photos.length === 0 && onDevice.length === 0 ? (
        <p className="mt-2 text-muted">No photos yet.</p>
      ) : (
        <ul className="mt-2 grid grid-cols-2 gap-2 sm:grid-cols-4">
          {visit.photos.map((photo) => (
            <li key={photo.id}>
              <a href={photo.url} target="_blank" rel="noreferrer" className="block">
                <img
                  src={photo.thumbnailUrl}
                  alt={`${KIND_LABELS[photo.kind]} photo${photo.caption ? `: ${photo.caption}` : ""}`}
                  className="aspect-[4/3] w-full rounded-card border-2 border-rule object-cover"
                />
                <span className="text-sm">{KIND_LABELS[photo.kind]}</span>
              </a>
            </li>
          ))}
          {onDevice.map((entry) => (
            <li key={entry.clientId}>
              <DevicePhoto entry={entry} />
              <span className="flex items-center gap-1 text-sm font-medium">
                <CloudOff aria-hidden className="size-4 shrink-0" />{" "}
                {entry.state === "waiting" ? "Waiting to send" : "Refused"}
              </span>
            </li>
          ))}
        </ul>
      )}
      {/* Waiting ones are marked on their pictures; a refused one also needs its reason and a way to discard it. */}
      <div className="mt-2">
        <WaitingEntries entries={onDevice.filter((entry) => entry.state === "refused")} />
      </div>
      {canUpload && (
        <div className="mt-3 space-y-2">
          {error && <FormAlert>{error}</FormAlert>}
          <div className="flex flex-wrap items-end gap-2">
            <div>
              <label htmlFor="photo-kind" className="block text-sm font-medium">
                Photo of
              </label>
              <select
                id="photo-kind"
                value={kind}
                onChange={(event) => setKind(event.target.value as typeof kind)}
                className="min-h-touch rounded-card border-2 border-rule bg-surface px-3"
              >
                {PHOTO_KINDS.map((value) => (
                  <option key={value} value={value}>
                    {KIND_LABELS[value]}
                  </option>
                ))}
              </select>
            </div>
            {/* The file inputs stay hidden and out of the Tab order: the buttons open them. */}
            <input
              ref={cameraInput}
              id="photo-camera"
              type="file"
              aria-label="Photo from the camera"
              tabIndex={-1}
              accept="image/jpeg,image/png,image/webp"
              capture="environment"
              className="sr-only"
              onChange={(event) => void send(event.target.files?.[0])}
            />
            <input
              ref={galleryInput}
              id="photo-gallery"
              type="file"
              aria-label="Photo from the gallery"
              tabIndex={-1}
              accept="image/jpeg,image/png,image/webp"
              className="sr-only"
              onChange={(event) => void send(event.target.files?.[0])}
            />
            {/* py-3: 52 px tall, over the 48 px target (min-h-touch alone gives 44). */}
            <Button
              variant="secondary"
              className="py-3"
              onClick={() => cameraInput.current?.click()}
              disabled={upload.isPending}
            >
              <Camera aria-hidden className="size-5" /> Take photo
            </Button>
            <Button
              variant="secondary"
              className="py-3"
              onClick={() => galleryInput.current?.click()}
              disabled={upload.isPending}
            >
              <Images aria-hidden className="size-5" /> Choose from gallery
            </Button>
          </div>
          <p className="text-xs text-muted" role="status">
            {upload.isPending
              ? "Uploading…"
              : kept
                ? "Kept on this device: it is sent when the signal returns."
                : "JPEG, PNG or WebP, up to 12 MB."}
          </p>
        </div>
      )}
    </section>
  );
}

/** A photo still on the device, shown from its kept file (the address lives as long as the picture). */
function DevicePhoto({ entry }: { entry: OutboxEntry }) {
  // The first read's Blob: each read of the outbox gives a new object for the same file (the
  // list keys this component by the entry's id, so another photo is another component).
  const [blob] = useState(entry.file?.blob);
  const [source, setSource] = useState<string>();
  useEffect(() => {
    if (!blob) return;
    const address = URL.createObjectURL(blob);
    // Made and revoked by the effect, so the address lives exactly as long as the picture shown (StrictMode's second mount included).
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setSource(address);
    return () => URL.revokeObjectURL(address);
  }, [blob]);
  return source ? (
    <img
      src={source}
      alt={`${entry.label}, on this device`}
      className="aspect-[4/3] w-full rounded-card border-2 border-dashed border-caution object-cover"
    />
  ) : (
    <div className="aspect-[4/3] w-full rounded-card border-2 border-dashed border-caution" />
  );
}
