import { useId, useState } from 'react';
import type { PriceBookImportPreview } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { useImportPriceBook } from '../api/price-book';
import { ImportPreview } from './import-preview';

/** Pick a .csv, see what it would change (with per-row errors), then confirm the import. */
export function ImportPanel({ currency }: { currency: string }) {
  const inputId = useId();
  const importCsv = useImportPriceBook();
  const [csv, setCsv] = useState<string | null>(null);
  const [preview, setPreview] = useState<PriceBookImportPreview | null>(null);
  const [message, setMessage] = useState<string | null>(null);

  async function pick(file: File | undefined) {
    setPreview(null);
    setMessage(null);
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    try {
      setPreview(await importCsv.mutateAsync({ csv: text, dryRun: true }));
    } catch (error) {
      setMessage(error instanceof ApiError ? error.message : 'The file could not be read.');
    }
  }

  async function confirm() {
    if (!csv) return;
    try {
      const done = await importCsv.mutateAsync({ csv, dryRun: false });
      setPreview(null);
      setCsv(null);
      setMessage(`Imported ${done.summary.total} rows.`);
    } catch (error) {
      setMessage(error instanceof ApiError ? error.message : 'The import failed.');
    }
  }

  const hasErrors = (preview?.summary.withErrors ?? 0) > 0;
  return (
    <div className="flex flex-col gap-3 rounded-lg border border-line bg-white p-4">
      <label htmlFor={inputId} className="font-semibold">
        Import a price book CSV
      </label>
      <input
        id={inputId}
        type="file"
        accept=".csv,text/csv"
        onChange={(event) => void pick(event.target.files?.[0])}
      />
      {message ? <p role="status">{message}</p> : null}
      {preview ? (
        <>
          <ImportPreview preview={preview} currency={currency} />
          {hasErrors ? (
            <p className="text-brick-700">
              Fix the rows with problems and pick the file again; nothing was imported.
            </p>
          ) : (
            <div>
              <Button onClick={() => void confirm()} isBusy={importCsv.isPending}>
                Import {preview.summary.total} rows
              </Button>
            </div>
          )}
        </>
      ) : null}
    </div>
  );
}
