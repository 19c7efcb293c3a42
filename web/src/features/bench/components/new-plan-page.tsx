import type { Account, BakePlanPreview, Culture, FormulaListItem, PreviewBakePlanRequest } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useEffect, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { FormAlert } from '@/components/form/form-alert';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { mapServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCultures } from '@/lib/logbook/get-cultures';
import { useCreatePlan } from '../api/create-plan';
import { useFormulaChoices } from '../api/get-formula-choices';
import { usePreviewPlan } from '../api/preview-plan';
import { clockStyleFor } from '../utils/clock';
import { PLAN_FIELD_OF, planFormDefaults, toPreviewRequest, type PlanFormValues } from '../utils/plan-form';
import { PlanFormFields } from './plan-form-fields';
import { PlanOptions, type Choice } from './plan-options';

/** The form's values as one string, keys sorted, to tell whether the options shown are for them. */
const formKey = (values: Partial<PlanFormValues>) => JSON.stringify(values, Object.keys(values).sort());

/** Plan a bake: the form, then "Show times" lays out the options; picking one starts the plan. */
export function NewPlanPage() {
  const account = useSignedInAccount();
  const formulas = useFormulaChoices();
  const cultures = useCultures({ archived: false, limit: 100 });

  if (formulas.isPending || cultures.isPending) return <PageLoader />;
  if (formulas.isError) return <LoadError error={formulas.error} onRetry={() => void formulas.refetch()} />;
  if (cultures.isError) return <LoadError error={cultures.error} onRetry={() => void cultures.refetch()} />;
  return <NewPlan account={account} formulas={formulas.data.items} cultures={cultures.data.items} />;
}

function NewPlan({
  account,
  formulas,
  cultures,
}: {
  account: Account;
  formulas: FormulaListItem[];
  cultures: Culture[];
}) {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const preview = usePreviewPlan();
  const create = useCreatePlan();
  const previewKey = useIdempotencyKey();
  const createKey = useIdempotencyKey();
  const [now, setNow] = useState(() => new Date());
  const [shown, setShown] = useState<{ request: PreviewBakePlanRequest; result: BakePlanPreview; form: string } | null>(
    null,
  );
  const [choosing, setChoosing] = useState<Choice | null>(null);
  const [createError, setCreateError] = useState<string | null>(null);
  const optionsRef = useRef<HTMLDivElement>(null);
  const only = formulas.length === 1 ? formulas[0]?.id : undefined;
  const { control, handleSubmit, setError, formState } = useForm<PlanFormValues>({
    defaultValues: planFormDefaults(account, now, params.get('formula') ?? only ?? ''),
  });
  const clock = { timeZone: account.timeZone, style: clockStyleFor(account.unitSystem) };

  // Options shown for other settings would mislead: any change hides them until asked again.
  const current = formKey(useWatch({ control }));
  const options = shown && shown.form === current ? shown : null;

  useEffect(() => {
    if (shown) optionsRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }, [shown]);

  const showServerErrors = (error: unknown) => {
    const { fieldErrors, formMessage } = mapServerErrors(error, Object.keys(PLAN_FIELD_OF));
    fieldErrors.forEach(({ field, message }, index) => {
      const name = PLAN_FIELD_OF[field as keyof typeof PLAN_FIELD_OF];
      setError(name, { type: 'server', message }, { shouldFocus: index === 0 });
    });
    if (formMessage !== null) setError('root.server', { type: 'server', message: formMessage });
  };

  const onShow = handleSubmit(async (values) => {
    const out = toPreviewRequest(values, account);
    if ('problems' in out) {
      out.problems.forEach((p, i) =>
        setError(p.field, { type: 'client', message: p.message }, { shouldFocus: i === 0 }),
      );
      return;
    }
    setCreateError(null);
    try {
      const result = await preview.mutateAsync({ body: out.request, headers: previewKey.headers() });
      previewKey.settle();
      setNow(new Date(result.plan.now));
      setShown({ request: out.request, result, form: formKey(values) });
    } catch (error) {
      previewKey.settle(error);
      showServerErrors(error);
    }
  });

  const onChoose = async (choice: Choice) => {
    if (!options) return;
    setChoosing(choice);
    setCreateError(null);
    try {
      const plan = await create.mutateAsync({ body: { ...options.request, ...choice }, headers: createKey.headers() });
      createKey.settle();
      void navigate(`/bench/${plan.id}`);
    } catch (error) {
      createKey.settle(error);
      setCreateError(mapServerErrors(error, []).formMessage);
      setChoosing(null);
    }
  };

  return (
    <Page title="Plan a bake" intro="Work back from when the bread should be ready — or start now — around your night.">
      <Stack component="form" noValidate spacing={2} onSubmit={(e) => void onShow(e)}>
        <PlanFormFields control={control} account={account} formulas={formulas} cultures={cultures} />
        <FormAlert message={formState.errors.root?.server?.message} />
        <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} sx={{ minHeight: 56 }}>
          Show times
        </Button>
      </Stack>
      {options && (
        <div ref={optionsRef} style={{ scrollMarginTop: 72 }}>
          <PlanOptions
            plan={options.result.plan}
            basis={options.result.kineticsBasis}
            account={account}
            clock={clock}
            now={now}
            choosing={choosing}
            onChoose={(c) => void onChoose(c)}
          />
        </div>
      )}
      <FormAlert message={createError ?? undefined} />
    </Page>
  );
}
