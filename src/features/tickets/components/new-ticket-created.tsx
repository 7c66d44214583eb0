import type { TicketDetail } from '@shared/schemas/tickets';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { UploadList } from '@/features/tickets/components/upload-list';
import type { UploadQueue } from '@/features/tickets/components/use-upload-queue';

interface TicketCreatedProps {
  ticket: TicketDetail;
  uploads: UploadQueue;
  /** Files that could not be sent (they can be tried again). */
  failures: number;
  onGoToTicket: () => void;
}

/** The ticket is open and its photos are on their way: their progress, a retry, and the way on. */
export function TicketCreated({ ticket, uploads, failures, onGoToTicket }: TicketCreatedProps) {
  return (
    <Card title={`${ticket.ref} is open`} description="The service desk has it. Your photos and videos are on their way.">
      <div className="space-y-4">
        <UploadList items={uploads.items} onRetry={(key) => uploads.retry(ticket.id, key).then(() => undefined)} />
        {failures > 0 ? (
          <Alert tone="danger" title={failures === 1 ? 'One file could not be sent.' : `${failures} files could not be sent.`}>
            <p>Try again, or go on to the ticket: you can add photos there too.</p>
          </Alert>
        ) : null}
        <div className="flex flex-wrap gap-2">
          <Button variant="primary" onClick={onGoToTicket} disabled={uploads.busy}>
            Go to the ticket
          </Button>
        </div>
      </div>
    </Card>
  );
}
