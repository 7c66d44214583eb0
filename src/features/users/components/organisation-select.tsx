import { useQuery } from '@tanstack/react-query';
import { useFormContext } from 'react-hook-form';
import { SelectField } from '@/components/ui/select-field';
import { errorMessage } from '@/lib/errors';
import { clientQueries } from '@/resources/clients';

/** The client organisation of a client user; '' in the select means "none" (null). */
export function OrganisationSelect({ name = 'clientId' }: { name?: string }) {
  const organisations = useQuery(clientQueries.options());
  const { formState } = useFormContext();
  const options = (organisations.data ?? []).map((o) => ({ value: o.id, label: o.name }));
  const hint = organisations.isPending
    ? 'Loading organisations…'
    : organisations.isError
      ? `The organisations could not be loaded. ${errorMessage(organisations.error)}`
      : options.length === 0
        ? 'There are no client organisations yet. Add the client first.'
        : 'The person will see this organisation and nothing else.';
  return (
    <SelectField
      name={name}
      label="Organisation"
      placeholder="Choose the organisation…"
      options={options}
      hint={hint}
      disabled={organisations.isPending || formState.isSubmitting}
      registerOptions={{ setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) }}
    />
  );
}
