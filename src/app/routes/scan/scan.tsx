import { Smartphone } from 'lucide-react';
import { useCallback } from 'react';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { CameraScanner } from '@/features/scan/components/camera-scanner';
import { SerialLookupForm } from '@/features/scan/components/serial-lookup-form';
import { requireUser, staff } from '@/app/auth-guard';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  return null;
}

/** Open a cabinet from its label: type the serial, or let the camera read the QR code. */
export function Component() {
  useDocumentTitle('Scan a label');
  const navigate = useNavigate();
  const open = useCallback((serial: string) => navigate(paths.cabinetLabel.getHref(serial)), [navigate]);
  return (
    <div className="mx-auto max-w-xl">
      <PageHeader
        title="Scan a label"
        description="Open a cabinet from the label on its back: type the serial (or its end), or scan the QR code."
      />
      <div className="space-y-4">
        <Card>
          <SerialLookupForm autoFocus hint="Printed on the label, above the QR code. The last few characters are enough." />
        </Card>
        <CameraScanner onSerial={open} />
        <p className="flex gap-3 rounded-md border border-stone-200 bg-white px-4 py-3 text-base text-stone-700">
          <Smartphone className="mt-0.5 h-5 w-5 shrink-0 text-ink-600" aria-hidden="true" />
          <span>Your phone&apos;s own camera app opens the labels too: point it at the QR code and tap the link it shows.</span>
        </p>
      </div>
    </div>
  );
}
