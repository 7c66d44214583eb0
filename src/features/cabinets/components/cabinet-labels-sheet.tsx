import QRCode from 'qrcode';
import { useEffect, useState } from 'react';
import { Spinner } from '@/components/ui/spinner';

/** The address a cabinet's QR label opens: `${origin}/c/<serial>`. */
export const labelUrl = (origin: string, serial: string) => `${origin}/c/${encodeURIComponent(serial)}`;

/**
 * QR codes as SVG text, made in the browser: error correction M (a label survives a scuff) and
 * the four-module quiet zone ISO/IEC 18004 asks for.
 */
function useQrCodes(urls: string[]) {
  const [codes, setCodes] = useState<Map<string, string> | null>(null);
  const key = urls.join('\n');
  useEffect(() => {
    let cancelled = false;
    const list = key ? key.split('\n') : [];
    Promise.all(
      list.map(async (url) => [url, await QRCode.toString(url, { type: 'svg', margin: 4, errorCorrectionLevel: 'M' })] as const),
    ).then((pairs) => {
      if (!cancelled) setCodes(new Map(pairs));
    });
    return () => {
      cancelled = true;
    };
  }, [key]);
  return codes;
}

// Three labels across and seven down, 63 × 36 mm: fits both A4 and US Letter with 10 mm margins
// (A4 190 × 277 mm, Letter 195.9 × 259.4 mm of printable area). The shell's bars do not print.
const printCss = `
@media print {
  @page { margin: 10mm; }
  html, body { background: #fff !important; }
  [data-shell] header, [data-shell] nav, [data-shell] aside, [data-shell] [aria-live], [data-print-hide] { display: none !important; }
  [data-shell], [data-shell] > div, [data-shell] main { padding: 0 !important; margin: 0 !important; max-width: none !important; min-height: 0 !important; background: #fff !important; }
  .label-sheet { display: grid !important; grid-template-columns: repeat(3, 63mm) !important; grid-auto-rows: 36mm !important; gap: 0 !important; }
  .cabinet-label { break-inside: avoid; border: 0.2mm dashed #c4cbca !important; border-radius: 0 !important; box-shadow: none !important; height: 36mm !important; padding: 2mm 2.5mm !important; gap: 0.5mm !important; }
  .cabinet-label .serial { font-size: 10.5pt !important; }
  .cabinet-label .qr { width: 26mm !important; height: 26mm !important; margin-left: -1.5mm; }
  * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}`;

/** What a label prints: only what stays true when the cabinet moves or is swapped. */
export interface LabelCabinet {
  id: string;
  serial: string;
  modelName: string;
}

interface CabinetLabelsSheetProps {
  cabinets: LabelCabinet[];
  origin: string;
}

/**
 * A printable sheet: one label per cabinet with its QR code, serial and model. No grid position
 * and no wall: a move or a swap would make them wrong, so the scan shows where the cabinet is now.
 */
export function CabinetLabelsSheet({ cabinets, origin }: CabinetLabelsSheetProps) {
  const codes = useQrCodes(cabinets.map((c) => labelUrl(origin, c.serial)));
  return (
    <>
      <style>{printCss}</style>
      {codes === null ? (
        <p className="py-10 text-center text-stone-600">
          <Spinner className="mr-2" label="" /> Making {cabinets.length} QR codes…
        </p>
      ) : (
        <div className="label-sheet grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-3 2xl:grid-cols-4" data-testid="label-sheet">
          {cabinets.map((c) => {
            const url = labelUrl(origin, c.serial);
            return (
              <div
                key={c.id}
                className="cabinet-label flex flex-col gap-1 overflow-hidden rounded-md border border-stone-300 bg-white px-3 py-2.5 shadow-card"
                data-testid="cabinet-label"
              >
                <p className="serial break-all font-mono text-[12pt] font-bold leading-tight text-black">{c.serial}</p>
                <div className="flex min-h-0 flex-1 items-center gap-2">
                  <div
                    className="qr -ml-2 h-28 w-28 shrink-0 [&>svg]:block [&>svg]:h-full [&>svg]:w-full"
                    role="img"
                    aria-label={`QR code for ${url}`}
                    // The SVG is made by the qrcode package from our own URL: no outside markup.
                    dangerouslySetInnerHTML={{ __html: codes.get(url) ?? '' }}
                  />
                  <div className="min-w-0 flex-1 leading-tight">
                    <p className="model line-clamp-3 text-[10pt] font-semibold text-black">{c.modelName}</p>
                    <p className="mt-1 text-[7pt] text-stone-700">Scan for where it is now and its history</p>
                  </div>
                </div>
              </div>
            );
          })}
        </div>
      )}
    </>
  );
}
