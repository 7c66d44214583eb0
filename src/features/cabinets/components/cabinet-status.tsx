import { cabinetStatuses, type CabinetStatus } from '@shared/schemas/enums';
import { StatusPill, type PillState } from '@/components/ui/badge';

export const cabinetStatusLabels: Record<CabinetStatus, string> = {
  installed: 'Installed',
  spare: 'Spare',
  at_bench: 'At bench',
  returned_to_vendor: 'Returned to vendor',
  retired: 'Retired',
};

const pillStates: Record<CabinetStatus, PillState> = {
  installed: 'installed',
  spare: 'spare',
  at_bench: 'at-bench',
  returned_to_vendor: 'returned',
  retired: 'retired',
};

export const cabinetStatusOptions = cabinetStatuses.map((value) => ({ value, label: cabinetStatusLabels[value] }));

export function CabinetStatusPill({ status, className }: { status: CabinetStatus; className?: string }) {
  return (
    <StatusPill state={pillStates[status]} className={className}>
      {cabinetStatusLabels[status]}
    </StatusPill>
  );
}
