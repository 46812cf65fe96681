import { FileUp } from 'lucide-react';
import { useId, useState } from 'react';
import {
  CSV_MAX_ROWS,
  csvFieldLabels,
  csvFields,
  csvUnits,
  fermentationReadingKinds,
  type CsvField,
  type CsvMapping,
  type CsvPreview,
} from '@shared/schemas/fermentation';
import { countOf } from '@/lib/plural';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useUnits } from '@/lib/units';
import { useImportCsv, usePreviewCsv } from '../api/import-csv';
import { shortDateTime } from './words';
import { Select } from '@/components/ui/select-field';


/** Upload, map the columns, look at the preview, then import all or nothing. */
export function CsvImport({ brewId }: { brewId: number }) {
  const inputId = useId();
  const preview = usePreviewCsv(brewId);
  const importer = useImportCsv(brewId);
  const [file, setFile] = useState<File | null>(null);
  const [result, setResult] = useState<CsvPreview | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const check = (f: File, mapping: CsvMapping | null) => {
    setDone(null);
    importer.reset();
    preview.mutate({ file: f, mapping }, { onSuccess: setResult, onError: () => setResult(null) });
  };
  const changeMapping = (mapping: CsvMapping) => {
    if (!file) return;
    setResult((r) => (r ? { ...r, mapping } : r));
    check(file, mapping);
  };

  const rowErrors = importer.error instanceof ApiError ? Object.entries(importer.error.fields).filter(([k]) => k.startsWith('rows.')) : [];
  const ready = result && !result.mappingErrors && result.errorCount === 0 && result.newCount > 0;

  return (
    <div className="space-y-4">
      <p className="text-sm text-ink-soft">
        Readings from a logger or a spreadsheet, in our CSV columns (taken_at, kind, value, unit, sample_temp_c, original_brix, instrument, note) or your own
        column names mapped below. Up to {CSV_MAX_ROWS.toLocaleString()} rows and 5 MB. One bad row and nothing is imported; readings already in the log are
        skipped.
      </p>
      <div>
        <label htmlFor={inputId} className="mb-1 block text-sm font-semibold text-ink-soft">
          CSV file
        </label>
        <input
          id={inputId}
          type="file"
          accept=".csv,.txt,text/csv,text/plain"
          className="block min-h-touch w-full text-base file:mr-3 file:min-h-touch file:rounded-lg file:border-0 file:bg-cellar-50 file:px-4 file:font-semibold file:text-cellar-700"
          onChange={(e) => {
            const f = e.target.files?.[0] ?? null;
            setFile(f);
            setResult(null);
            if (f) check(f, null);
          }}
        />
      </div>
      {preview.isPending && <p className="text-ink-soft">Reading the file…</p>}
      {preview.error && (
        <Notice tone="error" title="The file could not be used">
          {preview.error.message}
        </Notice>
      )}
      {result && file && (
        <>
          <MappingEditor preview={result} onChange={changeMapping} />
          <PreviewSummary preview={result} />
        </>
      )}
      {importer.error && (
        <Notice tone="error" title="Nothing was imported">
          <p>{rowErrors.length ? `${countOf(rowErrors.length, 'row')} ${rowErrors.length === 1 ? 'needs' : 'need'} attention.` : importer.error.message}</p>
          {rowErrors.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {rowErrors.map(([k, m]) => (
                <li key={k}>{m}</li>
              ))}
            </ul>
          )}
        </Notice>
      )}
      {done && <Notice tone="success">{done}</Notice>}
      {result && file && (
        <Button
          icon={<FileUp aria-hidden className="size-5" />}
          disabled={!ready}
          busy={importer.isPending}
          onClick={() =>
            importer.mutate(
              { file, mapping: result.mapping },
              {
                onSuccess: (r) => {
                  setDone(`Imported ${countOf(r.added, 'reading')}${r.skipped ? `; ${r.skipped} already in the log ${r.skipped === 1 ? 'was' : 'were'} skipped` : ''}.`);
                  setResult(null);
                  setFile(null);
                },
              },
            )
          }
        >
          {/* All or nothing: while any row has a problem, no count is offered, because nothing would be imported. */}
          {result.mappingErrors || result.errorCount > 0 ? 'Fix the problems to import' : result.newCount > 0 ? `Import ${countOf(result.newCount, 'reading')}` : 'Nothing new to import'}
        </Button>
      )}
    </div>
  );
}

function MappingEditor({ preview, onChange }: { preview: CsvPreview; onChange: (m: CsvMapping) => void }) {
  const { mapping } = preview;
  const columns = Array.from({ length: preview.columnCount }, (_, i) => (preview.header?.[i]?.trim() ? `“${preview.header[i]}”` : `Column ${i + 1}`));
  const setColumn = (field: CsvField, value: string) => onChange({ ...mapping, columns: { ...mapping.columns, [field]: value === '' ? null : Number(value) } });
  const errorFor = (path: string) => preview.mappingErrors?.[path];
  return (
    <fieldset className="space-y-3 rounded-lg p-3 ring-1 ring-cellar-100">
      <legend className="px-1 text-base font-semibold text-cellar-900">Which column is which?</legend>
      <label className="flex min-h-touch items-center gap-3">
        <input type="checkbox" className="size-5 accent-cellar-700" checked={mapping.hasHeader} onChange={(e) => onChange({ ...mapping, hasHeader: e.target.checked })} />
        The first row names the columns
      </label>
      <div className="grid gap-3 sm:grid-cols-2">
        {csvFields.map((field) => (
          <Select key={field} id={`map-${field}`} label={csvFieldLabels[field]} error={errorFor(`columns.${field}`)} value={mapping.columns[field] ?? ''} onChange={(e) => setColumn(field, e.target.value)}>
            <option value="">Not in the file</option>
            {columns.map((name, i) => (
              <option key={i} value={i}>
                {name}
              </option>
            ))}
          </Select>
        ))}
        {mapping.columns.unit === null && (
          <Select
            id="map-default-unit"
            label="Every value is in"
            error={errorFor('defaults.unit')}
            value={mapping.defaults.unit ?? ''}
            onChange={(e) => onChange({ ...mapping, defaults: { ...mapping.defaults, unit: (e.target.value || null) as CsvMapping['defaults']['unit'] } })}
          >
            <option value="">Choose…</option>
            {csvUnits.map((u) => (
              <option key={u} value={u}>
                {({ sg: 'SG', plato: '°Plato', brix: '°Brix', c: '°C', f: '°F' } as const)[u]}
              </option>
            ))}
          </Select>
        )}
        {mapping.columns.kind === null && (
          <Select
            id="map-default-kind"
            label="Every row is"
            value={mapping.defaults.kind ?? ''}
            onChange={(e) => onChange({ ...mapping, defaults: { ...mapping.defaults, kind: (e.target.value || null) as CsvMapping['defaults']['kind'] } })}
          >
            <option value="">Whatever the unit says</option>
            {fermentationReadingKinds.map((k) => (
              <option key={k} value={k}>
                {k === 'gravity' ? 'Gravity' : 'Temperature'}
              </option>
            ))}
          </Select>
        )}
      </div>
    </fieldset>
  );
}

function PreviewSummary({ preview }: { preview: CsvPreview }) {
  const units = useUnits();
  if (preview.mappingErrors) return <p className="text-sm text-ink-soft">Choose the columns above to see what each row becomes.</p>;
  return (
    <div className="space-y-3">
      <p className="text-base">
        <strong>{preview.rowCount}</strong> {preview.rowCount === 1 ? 'row' : 'rows'}: <strong>{preview.newCount}</strong> new, {preview.duplicateCount} already in the log,{' '}
        <span className={preview.errorCount ? 'font-semibold text-alert-700' : ''}>{preview.errorCount} with problems</span>.
      </p>
      {preview.errorCount > 0 && (
        <Notice tone="error" title={`Fix ${preview.errorCount === 1 ? 'this row' : `these ${preview.errorCount} rows`} and upload again`}>
          <ul className="list-disc pl-5">
            {preview.errors.map((e) => (
              <li key={`${e.row}-${e.field}`}>{e.message}</li>
            ))}
          </ul>
          {preview.errorCount > preview.errors.length && <p>…and {preview.errorCount - preview.errors.length} more.</p>}
        </Notice>
      )}
      <ol className="divide-y divide-cellar-100 rounded-lg ring-1 ring-cellar-100" aria-label="Preview of the first rows">
        {preview.rows.map((r) => (
          <li key={r.row} className="flex flex-wrap items-baseline gap-x-3 px-3 py-2 text-sm">
            <span className="w-14 shrink-0 text-ink-faint">Row {r.row}</span>
            {r.reading ? (
              <>
                <span>{shortDateTime(r.reading.takenAt)}</span>
                <span className="font-semibold tabular-nums">
                  {r.reading.corrected === null ? `${r.reading.value} ${r.reading.unit}` : units.format(r.reading.kind === 'gravity' ? 'gravity' : 'temperature', r.reading.corrected)}
                </span>
                <span className="text-ink-soft">{r.reading.instrument}</span>
                {r.reading.duplicate && <span className="rounded bg-cellar-50 px-1.5 text-xs font-semibold text-cellar-700">already in the log</span>}
              </>
            ) : (
              <span className="min-w-0 break-words font-semibold text-alert-700">{r.error ?? r.cells.join(', ')}</span>
            )}
          </li>
        ))}
      </ol>
    </div>
  );
}
