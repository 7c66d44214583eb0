import type { VisitDetail } from '@shared/schemas/visits';
import { Mail, MapPinned, Phone, Users } from 'lucide-react';
import { Card } from '@/components/ui/card';
import { buttonClasses } from '@/components/ui/button';
import { AddressLink } from '@/features/visits/components/address-link';
import { telHref } from '@/features/visits/utils/phone-link';

const cardTitle = (Icon: typeof Phone, text: string) => (
  <span className="inline-flex items-center gap-2">
    <Icon className="h-4 w-4 text-ink-600" aria-hidden="true" />
    {text}
  </span>
);

/** Where the visit is: the site's address (opens the maps app) and how to get in. */
export function VisitPlace({ visit }: { visit: VisitDetail }) {
  return (
    <Card title={cardTitle(MapPinned, 'Address and access')}>
      <AddressLink address={visit.site.address} className="-mt-2" />
      <h3 className="mt-3 text-sm font-semibold uppercase tracking-wide text-stone-600">Access</h3>
      {visit.site.accessNotes.trim() ? (
        <p className="mt-1 whitespace-pre-line text-base text-stone-900" data-testid="access-notes">
          {visit.site.accessNotes}
        </p>
      ) : (
        <p className="mt-1 text-base text-stone-600">No access notes for this site.</p>
      )}
    </Card>
  );
}

/** The people to ask for on site, each a tap away: call, or write. */
export function VisitContacts({ contacts }: { contacts: VisitDetail['contacts'] }) {
  return (
    <Card title={cardTitle(Users, 'On-site contacts')}>
      {contacts.length === 0 ? (
        <p className="text-base text-stone-600">No contacts on file for this site.</p>
      ) : (
        <ul className="space-y-4" aria-label="On-site contacts">
          {contacts.map((c) => (
            <li key={`${c.name}-${c.phone}`}>
              <p className="text-md font-semibold text-ink-950">{c.name}</p>
              {c.title ? <p className="text-sm text-stone-600">{c.title}</p> : null}
              <div className="mt-2 flex flex-wrap gap-2">
                {c.phone ? (
                  <a href={telHref(c.phone)} className={buttonClasses('secondary', 'lg', 'flex-1 justify-start')}>
                    <Phone className="h-5 w-5 text-ink-700" aria-hidden="true" />
                    <span className="sr-only">Call {c.name}: </span>
                    {c.phone}
                  </a>
                ) : null}
                {c.email ? (
                  <a href={`mailto:${c.email}`} className={buttonClasses('ghost', 'lg', 'max-w-full justify-start')}>
                    <Mail className="h-5 w-5 shrink-0" aria-hidden="true" />
                    <span className="sr-only">Write to {c.name}: </span>
                    <span className="truncate">{c.email}</span>
                  </a>
                ) : null}
              </div>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
