import { useEffect, useRef, useState, type ChangeEvent } from 'react';
import { isApiError } from '../../lib/api-client';
import { CameraIcon, PhotoIcon } from './action-icons';
import { Spinner } from './loading';

const PREVIEW_WIDTH = 240;

/** Refused before sending: the server would refuse it too, after a long upload on arena Wi-Fi. */
export function photoProblem(file: File, maxBytes: number): string | null {
  if (file.size > maxBytes) return `This photo is ${(file.size / 1024 / 1024).toFixed(1)} MB; at most ${maxBytes / 1024 / 1024} MB.`;
  return null;
}

/** Why an upload failed, in words: the server's message about the photo first. */
export function photoUploadMessage(error: unknown): string | undefined {
  if (isApiError(error)) return error.fields.photo ?? error.message;
  return error instanceof Error ? error.message : undefined;
}

/** Sends a picked photo unless it is too big; `tooBig` says why the last one was refused before sending. */
export function useAddPhoto(send: (file: File) => void, maxBytes: number) {
  const [tooBig, setTooBig] = useState<string | null>(null);
  function add(file: File) {
    const problem = photoProblem(file, maxBytes);
    setTooBig(problem);
    if (!problem) send(file);
  }
  return { add, tooBig };
}

interface PhotoPickerProps {
  label: string;
  onPick: (file: File) => void;
  pending?: boolean;
  disabled?: boolean;
}

/**
 * A button that opens the camera on a tablet or phone (`capture="environment"`, the back camera)
 * and the file picker elsewhere. The native input stays in the page (visually hidden) so the
 * keyboard and screen readers reach it through its label.
 */
export function PhotoPicker({ label, onPick, pending = false, disabled = false }: PhotoPickerProps) {
  function picked(event: ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    // Cleared, so that picking the same file again still counts.
    event.target.value = '';
    if (file) onPick(file);
  }
  const off = disabled || pending;
  return (
    <label
      className={`inline-flex min-h-12 cursor-pointer items-center justify-center gap-2 rounded-xl border-2 border-line-strong bg-surface px-4 font-semibold select-none hover:bg-sunken has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-focus ${
        off ? 'cursor-not-allowed opacity-60' : ''
      }`}
    >
      {pending ? <Spinner /> : <CameraIcon className="size-6" />}
      {label}
      <input type="file" accept="image/*" capture="environment" className="sr-only" disabled={off} onChange={picked} />
    </label>
  );
}

/**
 * A small preview of a photo picked but not sent yet, drawn on a canvas: the page's content policy
 * allows no `blob:` images, and a data URL of a 10 MB photo would be a 13 MB string. A photo this
 * browser cannot decode (HEIC on most) shows its name only.
 */
export function PickedPhoto({ file, onRemove }: { file: File; onRemove: () => void }) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const [drawn, setDrawn] = useState<boolean | null>(null);
  useEffect(() => {
    let current = true;
    createImageBitmap(file)
      .then((bitmap) => {
        const canvas = canvasRef.current;
        if (!current || !canvas) return bitmap.close();
        const scale = Math.min(1, PREVIEW_WIDTH / bitmap.width);
        canvas.width = Math.round(bitmap.width * scale);
        canvas.height = Math.round(bitmap.height * scale);
        canvas.getContext('2d')?.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
        bitmap.close();
        setDrawn(true);
      })
      .catch(() => current && setDrawn(false));
    return () => {
      current = false;
    };
  }, [file]);
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-xl border-2 border-line p-2">
      <canvas ref={canvasRef} role="img" aria-label="The photo to send" data-drawn={drawn ?? undefined} className={`h-20 w-28 rounded-lg bg-sunken object-cover ${drawn === false ? 'hidden' : ''}`} />
      {drawn === false && <PhotoIcon className="size-10 text-ink-muted" />}
      <p className="min-w-0 flex-1 basis-32 break-words">
        {file.name}
        {drawn === false && <span className="block text-sm text-ink-muted">No preview here; it is sent as it is.</span>}
      </p>
      <button type="button" onClick={onRemove} className="min-h-12 rounded-xl px-4 font-semibold text-accent-ink underline-offset-4 hover:underline">
        Remove photo
      </button>
    </div>
  );
}
