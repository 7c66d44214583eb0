import { Download, FileSpreadsheet, Upload } from 'lucide-react';
import { useId, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { useImportCabinets } from '@/features/cabinets/api/mutations';
import { CabinetImportError } from '@/resources/cabinets';
import { downloadCsv, toCsv } from '@/lib/csv';
import { errorMessage } from '@/lib/errors';

const templateHeader = ['serial', 'column', 'row', 'batch'];

interface CabinetImportProps {
  /** `installedCabinets`: the cabinets on the wall now; an import only fills the free positions. */
  wall: { id: string; name: string; columns: number; rows: number; installedCabinets: number };
  /** Where "see them on the map" goes after a successful import. */
  mapHref: string;
}

type Outcome = { kind: 'imported'; count: number } | { kind: 'refused'; error: unknown } | null;

/** The cabinet lines of a picked file (every non-empty line after the header), for a warning before upload. */
async function cabinetLines(file: File) {
  const lines = (await file.text()).split(/\r\n|\n|\r/).filter((l) => l.trim() !== '');
  return Math.max(0, lines.length - 1);
}

const positions = (n: number) => `${n.toLocaleString('en')} ${n === 1 ? 'position' : 'positions'}`;

/**
 * How many positions the wall has free, said before a file is picked: a full wall refuses every
 * line, and a file with more lines than free positions cannot fit.
 */
function FreePositions({ wall, lines }: { wall: CabinetImportProps['wall']; lines: number | null }) {
  const total = wall.columns * wall.rows;
  const free = Math.max(0, total - wall.installedCabinets);
  if (free === 0) {
    return (
      <Alert
        tone="danger"
        title={`Every position of ${wall.name} is taken (${total.toLocaleString('en')} of ${total.toLocaleString('en')})`}
      >
        An import only adds cabinets at free positions, so any file for this wall would be refused. Move cabinets off the wall, or enlarge
        its grid, first.
      </Alert>
    );
  }
  const tooMany = lines !== null && lines > free;
  if (wall.installedCabinets === 0 && !tooMany) return null;
  return (
    <Alert tone={tooMany ? 'danger' : 'info'} title={`${positions(free)} free of ${total.toLocaleString('en')}`} live={tooMany}>
      {tooMany
        ? `The file has ${lines.toLocaleString('en')} cabinet lines: more than the wall has free positions, so some would land on taken ones and the file would be refused.`
        : `${wall.installedCabinets.toLocaleString('en')} ${wall.installedCabinets === 1 ? 'cabinet is' : 'cabinets are'} registered on this wall already; the file may only name free positions.`}
    </Alert>
  );
}

function fileSize(bytes: number) {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

/**
 * CSV import of a wall's cabinets: pick a file of `serial,column,row,batch`, upload it with a
 * progress bar, then either "N cabinets imported" or the table of refused rows (all or nothing).
 */
export function CabinetImport({ wall, mapHref }: CabinetImportProps) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const [lines, setLines] = useState<number | null>(null);
  const importCabinets = useImportCabinets();

  const pick = (picked: File | null) => {
    setFile(picked);
    setOutcome(null);
    setLines(null);
    if (picked) void cabinetLines(picked).then(setLines, () => setLines(null));
  };

  const upload = async () => {
    if (!file) return;
    setOutcome(null);
    setProgress(0);
    try {
      const result = await importCabinets.mutateAsync({ wallId: wall.id, file, onProgress: setProgress });
      setOutcome({ kind: 'imported', count: result.imported });
      setFile(null);
      setLines(null);
      if (inputRef.current) inputRef.current.value = '';
    } catch (error) {
      setOutcome({ kind: 'refused', error });
    } finally {
      setProgress(null);
    }
  };

  const refusedRows = outcome?.kind === 'refused' && outcome.error instanceof CabinetImportError ? outcome.error.rows : [];

  return (
    <Card
      title="Import cabinets from a CSV file"
      description={`One line per cabinet of ${wall.name}: its serial, its position (column 1–${wall.columns}, row 1–${wall.rows}, counted from the top-left as the audience sees the wall) and its module batch.`}
    >
      <div className="space-y-5">
        {outcome?.kind === 'imported' ? null : <FreePositions wall={wall} lines={file ? lines : null} />}
        <div className="flex flex-wrap items-center gap-3">
          <Button
            size="sm"
            icon={<Download className="h-4 w-4" aria-hidden="true" />}
            onClick={() => downloadCsv(`cabinets-template.csv`, toCsv(templateHeader, []))}
          >
            Download the template
          </Button>
          <p className="text-sm text-stone-600">
            First line: <code className="rounded bg-stone-100 px-1 font-mono">serial,column,row,batch</code>. Nothing is imported unless
            every line is right.
          </p>
        </div>

        <div className="space-y-1.5">
          <label htmlFor={inputId} className="text-sm font-medium text-stone-800">
            CSV file
          </label>
          <input
            ref={inputRef}
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => pick(e.target.files?.[0] ?? null)}
            className="block w-full text-base text-stone-800 file:mr-3 file:min-h-touch file:cursor-pointer file:rounded file:border file:border-stone-300 file:bg-white file:px-4 file:text-base file:font-medium file:text-ink-900 hover:file:bg-stone-50 md:file:min-h-10"
          />
          {file ? (
            <p className="flex items-center gap-1.5 text-sm text-stone-700">
              <FileSpreadsheet className="h-4 w-4 text-ink-500" aria-hidden="true" />
              {file.name} · {fileSize(file.size)}
            </p>
          ) : null}
        </div>

        <div className="flex flex-wrap items-center gap-3">
          <Button
            variant="primary"
            onClick={upload}
            disabled={!file}
            loading={progress !== null}
            icon={<Upload className="h-4 w-4" aria-hidden="true" />}
          >
            Import
          </Button>
          {progress !== null ? <ProgressBar value={progress} label={progress < 1 ? 'Uploading' : 'Checking every line'} /> : null}
        </div>

        {outcome?.kind === 'imported' ? (
          <Alert tone="success" title={`${outcome.count} ${outcome.count === 1 ? 'cabinet' : 'cabinets'} imported`}>
            <Link to={mapHref} className="link">
              See them on the wall map
            </Link>
          </Alert>
        ) : null}

        {outcome?.kind === 'refused' ? (
          <div className="space-y-3">
            <Alert tone="danger" title={refusedRows.length ? 'Nothing was imported' : 'The file was not imported'}>
              {errorMessage(outcome.error)}
            </Alert>
            {refusedRows.length ? (
              <div className="overflow-x-auto rounded-md border border-stone-200">
                <table className="w-full text-left text-sm" data-testid="import-errors">
                  <caption className="sr-only">Lines of the file that have a problem</caption>
                  <thead className="bg-stone-50 text-xs font-semibold text-stone-600">
                    <tr>
                      <th scope="col" className="px-3 py-2 text-right">
                        Line
                      </th>
                      <th scope="col" className="px-3 py-2">
                        Serial
                      </th>
                      <th scope="col" className="px-3 py-2">
                        Problem
                      </th>
                    </tr>
                  </thead>
                  <tbody>
                    {refusedRows.map((r, i) => (
                      <tr key={`${r.line}-${i}`} className="border-t border-stone-100">
                        <td className="px-3 py-2 text-right tabular-nums">{r.line}</td>
                        <td className="px-3 py-2 font-mono">{r.serial || '—'}</td>
                        <td className="px-3 py-2">{r.message}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            ) : null}
          </div>
        ) : null}
      </div>
    </Card>
  );
}

function ProgressBar({ value, label }: { value: number; label: string }) {
  const percent = Math.round(value * 100);
  return (
    <div className="flex min-w-[12rem] flex-1 items-center gap-3">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2.5 flex-1 overflow-hidden rounded-full bg-stone-200"
      >
        <div className="h-full rounded-full bg-ink-600 transition-[width]" style={{ width: `${percent}%` }} />
      </div>
      <span className="w-32 text-sm tabular-nums text-stone-700">{value < 1 ? `${percent} %` : label}</span>
    </div>
  );
}
