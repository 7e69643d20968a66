import { useState } from 'react';
import type { UseFormSetError } from 'react-hook-form';
import { useActivatePlanMutation, useSavePlanMutation } from '@/hooks/use-plans';
import { isApiError } from '@/lib/api-client';
import type { PlanSettings } from '@/shared/schemas/plan-settings';
import type { ActivatedPlan, PlanVersion } from '@/shared/schemas/plan';
import { fieldOfIssue, type PlanFormValues } from './plan-form';

/**
 * Save and activate for the builder. The first save of an active version makes a new draft version;
 * later saves change that draft in place. Server 422 issues go back beside their fields.
 */
export function usePlanSave(musicianId: string, opened: PlanVersion | null, setError: UseFormSetError<PlanFormValues>) {
  const save = useSavePlanMutation(musicianId);
  const activate = useActivatePlanMutation(musicianId);
  const [draft, setDraft] = useState<PlanVersion | null>(opened?.status === 'draft' ? opened : null);
  const [message, setMessage] = useState<string | null>(null);
  const [activated, setActivated] = useState<ActivatedPlan | null>(null);

  async function saveDraft(settings: PlanSettings): Promise<PlanVersion | null> {
    setMessage(null);
    try {
      const planId = draft?.id ?? opened?.id;
      const saved = await save.mutateAsync({ planId: opened?.status === 'superseded' ? undefined : planId, body: { settings } });
      setDraft(saved);
      return saved;
    } catch (error) {
      if (isApiError(error) && error.issues.length > 0) {
        const unplaced: string[] = [];
        for (const issue of error.issues) {
          const field = fieldOfIssue(issue.path);
          if (field) setError(field, { type: 'server', message: issue.message }, { shouldFocus: true });
          else unplaced.push(issue.message);
        }
        setMessage(unplaced.length > 0 ? unplaced.join(' ') : 'The server found problems in the fields marked below.');
      } else {
        setMessage(isApiError(error) ? error.message : 'The plan could not be saved. Try again.');
      }
      return null;
    }
  }

  async function activateDraft(planId: string): Promise<void> {
    setMessage(null);
    try {
      setActivated(await activate.mutateAsync(planId));
    } catch (error) {
      setMessage(isApiError(error) ? error.message : 'The plan could not be activated. Try again.');
    }
  }

  return { draft, message, activated, saveDraft, activateDraft, saving: save.isPending, activating: activate.isPending };
}
