import { useQuery } from '@tanstack/react-query';
import { Alert } from '@/components/ui/alert';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { ChoiceButtons } from '@/features/repairs/components/choice-buttons';
import { wallQueries } from '@/resources/walls';

/** A visit or ticket that names no wall: the technician picks the site's wall first. */
export function WallChooser({ siteId, onChoose }: { siteId: string | null; onChoose: (wallId: string) => void }) {
  const walls = useQuery(wallQueries.page(siteId ? { siteId } : {}));
  if (walls.isPending) return <Spinner label="Loading the walls" />;
  if (walls.isError) {
    return <LoadError title="The walls could not be loaded." error={walls.error} />;
  }
  if (!walls.data.items.length) return <Alert tone="info">This site has no wall in the register.</Alert>;
  return (
    <section className="space-y-3" aria-label="Which wall?">
      <h2 className="text-xl font-semibold text-ink-950">Which wall?</h2>
      <ChoiceButtons
        label="Wall"
        columns={1}
        choices={walls.data.items.map((w) => ({
          value: w.id,
          label: w.name,
          hint: `${w.siteName} · ${w.columns} × ${w.rows} cabinets`,
        }))}
        value={null}
        onChoose={onChoose}
      />
    </section>
  );
}
