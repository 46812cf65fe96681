import { Camera, RefreshCw, Trash2 } from 'lucide-react';
import { useId, useRef, useState } from 'react';
import { PHOTO_MAX_BYTES, readingKindInSentence, readingKindLabels, type BrewDeviation, type BrewReading, type ReadingPhoto } from '@shared/schemas/brews';
import { describeDeviation } from '@shared/brew-deviations';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Figure } from '@/components/ui/figure';
import { ApiError, NetworkError } from '@/lib/api-client';
import { useUnits } from '@/lib/units';
import { useDeletePhoto } from '../api/delete-photo';
import { useDeleteReading } from '../api/delete-reading';
import { useRecomputeReading } from '../api/recompute-reading';
import { useUploadPhoto } from '../api/upload-photo';
import { correctedText, correctionText, instrumentText, rawText, timeText, deviationTitle } from './describe';
import { NotSaved } from './not-saved';

interface ReadingCardProps {
  brewId: number;
  reading: BrewReading;
  deviations: readonly BrewDeviation[];
  canEdit: boolean;
}

/** One stored reading: as read and corrected side by side, the instrument, cautions, photos. */
export function ReadingCard({ brewId, reading, deviations, canEdit }: ReadingCardProps) {
  const units = useUnits();
  const headingId = useId();
  const recompute = useRecomputeReading(brewId);
  const remove = useDeleteReading(brewId);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const mine = deviations.filter((d) => d.readingId === reading.id);
  return (
    <article aria-labelledby={headingId} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h4 id={headingId} className="font-bold text-cellar-900">
          {readingKindLabels[reading.kind]}
        </h4>
        <span className="text-sm text-ink-faint">{timeText(reading.takenAt)}</span>
      </header>
      <dl className="mt-2 grid grid-cols-2 gap-2">
        <Figure className="min-w-0" labelStyle="plain" size="xl" label="As read" value={rawText(reading, units)} />
        <Figure className="min-w-0" labelStyle="plain" size="xl" tone="strong" label="Corrected" value={correctedText(reading, units)} />
      </dl>
      <p className="mt-1 text-sm text-ink-soft">
        {instrumentText(reading)}
        {correctionText(reading, units) && <> · {correctionText(reading, units)}</>}
        {reading.volumeL !== null && <> · {units.format('volume', reading.volumeL)}</>}
        {typeof reading.raw.minutesLeft === 'number' && <> · {reading.raw.minutesLeft} min left</>}
      </p>
      {reading.recomputedAt && reading.recomputedFrom && (
        <p className="mt-1 text-sm text-ink-soft">
          Recomputed with a newer calibration; it was {correctedText({ quantity: reading.quantity, corrected: reading.recomputedFrom.corrected }, units)}.
        </p>
      )}
      {reading.note && <p className="mt-2 whitespace-pre-line">{reading.note}</p>}
      {mine.map((d) => (
        <Notice key={`${d.code}-${d.readingId}`} tone="caution" className="mt-2" title={deviationTitle(d)}>
          {describeDeviation(d, units)}
        </Notice>
      ))}
      {reading.warnings.map((w) => (
        <p key={w} className="mt-2 text-sm text-malt-700">
          {w}
        </p>
      ))}
      {reading.photos.length > 0 && (
        <ul className="mt-3 flex flex-wrap gap-2">
          {reading.photos.map((p) => (
            <li key={p.id}>
              <Photo brewId={brewId} photo={p} canDelete={canEdit} label={`Photo of the ${readingKindInSentence(reading.kind)} reading`} />
            </li>
          ))}
        </ul>
      )}
      {canEdit && (
        <div className="no-print mt-3 flex flex-wrap gap-2">
          <PhotoUpload brewId={brewId} readingId={reading.id} />
          {reading.instrumentId !== null && (
            <Button
              variant="quiet"
              busy={recompute.isPending}
              icon={<RefreshCw aria-hidden className="size-5" />}
              onClick={() => recompute.mutate(reading.id)}
              title="Apply the instrument's current calibration to this reading; the log keeps the old value."
            >
              Recompute
            </Button>
          )}
          {confirmDelete ? (
            <Button variant="danger" busy={remove.isPending} onClick={() => remove.mutate(reading.id)}>
              Delete for good
            </Button>
          ) : (
            <Button variant="quiet" icon={<Trash2 aria-hidden className="size-5" />} onClick={() => setConfirmDelete(true)}>
              Delete
            </Button>
          )}
        </div>
      )}
      {recompute.error && <Notice tone="error" className="mt-2">{recompute.error.message}</Notice>}
      {remove.error && <Notice tone="error" className="mt-2">{remove.error.message}</Notice>}
    </article>
  );
}

function Photo({ brewId, photo, label, canDelete }: { brewId: number; photo: ReadingPhoto; label: string; canDelete: boolean }) {
  const remove = useDeletePhoto(brewId);
  const { url } = photo;
  return (
    <figure className="relative">
      <a href={url} target="_blank" rel="noreferrer">
        <img src={url} alt={label} className="size-24 rounded-lg object-cover ring-1 ring-cellar-100" loading="lazy" />
      </a>
      {canDelete && (
        <button
          type="button"
          className="no-print absolute right-0 top-0 flex min-h-touch min-w-touch items-center justify-center rounded-lg bg-white/80 text-alert-700"
          aria-label="Delete this photo"
          onClick={() => remove.mutate(photo)}
        >
          <Trash2 aria-hidden className="size-5" />
        </button>
      )}
    </figure>
  );
}

/** Adds a photo of the reading; the server checks it is an image and not too big. */
function PhotoUpload({ brewId, readingId }: { brewId: number; readingId: number }) {
  const upload = useUploadPhoto(brewId);
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [offline, setOffline] = useState(false);
  const [queued, setQueued] = useState(false);
  const id = useId();

  async function send(chosen: File) {
    setProblem(null);
    setOffline(false);
    setQueued(false);
    if (chosen.size > PHOTO_MAX_BYTES) {
      setProblem(`The photo is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB. Take it at a lower resolution or crop it, then try again.`);
      return;
    }
    try {
      const outcome = await upload.mutateAsync({ readingId, file: chosen });
      setQueued(outcome.status === 'queued');
      setFile(null);
      if (input.current) input.current.value = '';
    } catch (error) {
      if (error instanceof NetworkError) setOffline(true);
      else setProblem(error instanceof ApiError ? error.message : (error as Error).message);
    }
  }

  return (
    <div className="w-full space-y-2">
      <label htmlFor={id} className="inline-flex min-h-touch cursor-pointer items-center gap-2 rounded-lg px-4 font-semibold text-cellar-700 ring-1 ring-inset ring-cellar-300 hover:bg-cellar-50">
        <Camera aria-hidden className="size-5" /> {upload.isPending ? 'Uploading…' : 'Add a photo'}
      </label>
      <input
        ref={input}
        id={id}
        type="file"
        accept="image/jpeg,image/png,image/webp"
        capture="environment"
        className="sr-only"
        onChange={(e) => {
          const chosen = e.target.files?.[0];
          if (chosen) {
            setFile(chosen);
            void send(chosen);
          }
        }}
      />
      {problem && <Notice tone="error">{problem}</Notice>}
      {queued && <Notice tone="success">Photo kept on this device: waiting to send.</Notice>}
      {offline && file && <NotSaved busy={upload.isPending} onRetry={() => void send(file)} />}
    </div>
  );
}
