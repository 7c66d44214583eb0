import type { VisitDetail } from '@shared/schemas/visits';
import { useEffect } from 'react';
import type { z } from 'zod';
import { Card } from '@/components/ui/card';
import { Checkbox } from '@/components/ui/checkbox';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { useCloseVisit } from '@/features/visits/api/mutations';
import { SignatureField } from '@/features/visits/components/signature-field';
import { VisitChecklist } from '@/features/visits/components/visit-checklist';
import { useVisitChecklist } from '@/features/visits/hooks/use-visit-checklist';
import { closeForm, type CloseForm } from '@/features/visits/utils/close-form';
import { clearDraft, draftKeys, readDraft, writeDraft } from '@/features/visits/utils/local-draft';

/** What is kept on the phone until the visit is closed: everything typed (the drawing is redrawn). */
type CloseDraft = Pick<CloseForm, 'summary' | 'noSigner' | 'signedByName' | 'unsignedReason'>;

/**
 * Closing a visit: the summary the client reads in the report, the checklist, and the client's
 * signature (or why no one could sign). What is typed stays on the phone until it is sent.
 */
export function CloseVisitForm({ visit, onClosed }: { visit: VisitDetail; onClosed: () => void }) {
  const draftKey = draftKeys.close(visit.id);
  const checklist = useVisitChecklist(visit, true);
  const close = useCloseVisit();
  const form = useZodForm(closeForm, {
    defaultValues: {
      summary: visit.summary,
      noSigner: false,
      signedByName: '',
      unsignedReason: '',
      ...readDraft<CloseDraft>(draftKey),
      signature: '',
      checklist: checklist.items,
    },
  });
  const noSigner = form.watch('noSigner');

  // The checklist is ticked (and saved) on its own; the close request carries it as it stands.
  useEffect(() => form.setValue('checklist', checklist.items), [form, checklist.items]);

  useEffect(() => {
    const typing = form.watch(({ summary = '', noSigner = false, signedByName = '', unsignedReason = '' }) =>
      writeDraft(draftKey, { summary, noSigner, signedByName, unsignedReason } satisfies CloseDraft),
    );
    return () => typing.unsubscribe();
  }, [form, draftKey]);

  const submit = async (input: z.output<typeof closeForm>) => {
    await close.mutateAsync({ id: visit.id, ...input });
    clearDraft(draftKey);
    checklist.forget();
    onClosed();
  };

  return (
    <Form form={form} onSubmit={submit}>
      <Card title="For the client">
        <TextAreaField
          name="summary"
          label="Summary of the visit"
          hint="The client reads this in the visit report: what was wrong, what was done, anything still to do."
          rows={6}
        />
      </Card>

      <VisitChecklist
        items={checklist.items}
        onToggle={checklist.toggle}
        state={checklist.state}
        error={checklist.error}
        onRetry={checklist.retry}
      />

      <Card title="Sign-off">
        <div className="space-y-4">
          {noSigner ? (
            <TextAreaField name="unsignedReason" label="Why no one could sign" hint="For example: no one on site after hours." rows={3} />
          ) : (
            <>
              <p className="text-base text-stone-700">Hand the phone to the client’s contact on site.</p>
              <SignatureField name="signature" label="Signature" />
              <TextField name="signedByName" label="Name of the person signing" autoComplete="off" autoCapitalize="words" />
            </>
          )}
          <div className="rounded-md border border-stone-200 px-3">
            <Checkbox name="noSigner" label="No one could sign" />
          </div>
        </div>
      </Card>

      <SubmitButton size="lg" className="w-full">
        Close visit and send the report
      </SubmitButton>
    </Form>
  );
}
