import { Clock, MapPin } from 'lucide-react';
import { Card } from '@/components/ui/card';
import type { SiteDetail } from '@shared/schemas/sites';
import { formatSiteTime, utcOffset } from '@/lib/site-time';

/** Address and the site's time zone with its local time now. */
export function SiteAddressCard({ site }: { site: SiteDetail }) {
  const cityLine = [site.city, [site.region, site.postalCode].filter(Boolean).join(' ')].filter(Boolean).join(', ');
  const lines = [site.address, cityLine, site.country].filter((l) => l && l.trim());
  return (
    <Card title="Address and time">
      <dl className="space-y-3">
        <div className="flex gap-3">
          <dt>
            <MapPin className="mt-0.5 h-5 w-5 text-ink-500" aria-hidden="true" />
            <span className="sr-only">Address</span>
          </dt>
          <dd>
            {lines.length ? (
              <address className="not-italic">
                {lines.map((l) => (
                  <span key={l} className="block">
                    {l}
                  </span>
                ))}
              </address>
            ) : (
              <span className="text-stone-500">No address yet.</span>
            )}
          </dd>
        </div>
        <div className="flex gap-3">
          <dt>
            <Clock className="mt-0.5 h-5 w-5 text-ink-500" aria-hidden="true" />
            <span className="sr-only">Time zone</span>
          </dt>
          <dd>
            <span className="block">
              {site.timeZone.replace(/_/g, ' ')} <span className="text-stone-500">({utcOffset(site.timeZone)})</span>
            </span>
            <span className="text-sm text-stone-600">Local time now: {formatSiteTime(new Date(), site.timeZone)}</span>
          </dd>
        </div>
      </dl>
    </Card>
  );
}
