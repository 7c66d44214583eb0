import type { z } from 'zod';
import { Alert } from '@/components/ui/alert';

const fieldNames: Record<string, string> = {
  cabinet: 'Cabinet',
  columns: 'Columns',
  rows: 'Rows',
  target: 'Target size',
  supply: 'Supply',
  outputCapacityPixels: 'Output capacity',
  input: 'Input',
  processorOutputs: 'Processor outputs',
  dataCableToWallM: 'Data cable',
  cardsPerCabinet: 'Receiving cards',
};

/** What the plan still needs, field by field, while the figures are not valid. */
export function PlanNeeds({ issues }: { issues: readonly z.core.$ZodIssue[] }) {
  return (
    <Alert tone="info" title="The plan needs:" live={false}>
      <ul className="list-disc space-y-0.5 pl-5">
        {issues.slice(0, 8).map((issue, i) => (
          <li key={i}>
            {fieldNames[String(issue.path[0])] ?? 'A field'}: {issue.message}
          </li>
        ))}
      </ul>
    </Alert>
  );
}
