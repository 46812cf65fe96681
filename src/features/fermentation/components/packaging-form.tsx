import { Form, Formik, useField, useFormikContext } from 'formik';
import { BrewMathError, primingSugarG, residualCo2Volumes } from '@shared/brewmath';
import {
  BOTTLE_CO2_CAUTION_VOLUMES,
  packagingInputSchema,
  packagingSugarLabels,
  packagingSugars,
  type FermentationLog,
  type PackagingContainer,
  type PackagingInput,
  type PackagingSugar,
} from '@shared/schemas/fermentation';
import { Button } from '@/components/ui/button';
import { cautionTexts } from '@/components/ui/cautions';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useUnits } from '@/lib/units';
import { useRecordPackaging } from '../api/packaging';
import { fromLocalInput, toLocalInput, verdictTitles } from './words';
import { SaveNotice } from '@/components/ui/save-notice';
import { typedNumber } from '@shared/schemas/fields';

interface Values {
  container: PackagingContainer;
  volumeL: number | '';
  warmestTempC: number | '';
  targetCo2Volumes: string;
  sugar: PackagingSugar;
  packagedAt: string;
  override: boolean;
  overrideReason: string;
  note: string;
}


function toInput(v: Values): PackagingInput {
  return {
    container: v.container,
    volumeL: v.volumeL === '' ? (undefined as unknown as number) : v.volumeL,
    warmestTempC: v.warmestTempC === '' ? (undefined as unknown as number) : v.warmestTempC,
    targetCo2Volumes: typedNumber(v.targetCo2Volumes) as number,
    sugar: v.sugar,
    packagedAt: fromLocalInput(v.packagedAt),
    override: v.override,
    overrideReason: v.overrideReason,
    note: v.note,
  };
}

/** What to package, and how much priming sugar that takes, worked out as you type. */
export function PackagingForm({ log }: { log: FermentationLog }) {
  const record = useRecordPackaging(log.brew.id);
  const stable = log.verdict?.state === 'stable';
  const warmest = log.temperature.overall?.maxC ?? log.brew.fermentationTempMaxC;
  const initial: Values = {
    container: 'bottles',
    // What really went into the fermenter, else the recipe's plan.
    volumeL: log.brew.fermenterVolumeL ?? log.brew.batchVolumeL ?? '',
    warmestTempC: warmest !== null ? Math.min(30, Math.max(0, Number(warmest.toFixed(1)))) : '',
    targetCo2Volumes: '2.4',
    sugar: 'sucrose',
    packagedAt: toLocalInput(new Date()),
    override: false,
    overrideReason: '',
    note: '',
  };
  return (
    <Formik<Values>
      initialValues={initial}
      validate={(v) => zodValidate(packagingInputSchema)(toInput(v))}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await record.mutateAsync(toInput(values));
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ values, isSubmitting, status, submitForm, errors }) => (
        <Form noValidate className="space-y-4" aria-label="Packaging">
          <ContainerPicker />
          {values.container === 'keg' && (
            <Notice tone="caution" title="Gas under pressure">
              {cautionTexts.co2}
            </Notice>
          )}
          <div className="grid gap-4 sm:grid-cols-2">
            <QuantityField
              name="volumeL"
              kind="volume"
              label="Beer to package"
              hint={log.brew.fermenterVolumeL !== null ? 'From the volume you measured into the fermenter; less any left behind on the yeast.' : 'The recipe’s batch volume; change it to what you have.'}
            />
            <QuantityField
              name="warmestTempC"
              kind="temperature"
              label="Warmest temperature the beer reached"
              hint={log.temperature.overall ? 'From your fermenter readings; change it if the beer was warmer since.' : 'Since fermentation ended, or during it.'}
            />
            <TextField name="targetCo2Volumes" label="Carbonation wanted (volumes of CO2)" inputMode="decimal" hint="About 2.0 to 2.7 for most beers." />
            <SugarPicker />
          </div>
          <SugarResult />
          <TextField name="packagedAt" type="datetime-local" label="Packaged at" />
          <TextField name="note" label="Note (optional)" maxLength={500} />
          {!stable && (
            <div className="space-y-3 rounded-lg bg-alert-50 p-3 ring-1 ring-alert-500/30">
              <p className="text-sm font-semibold text-alert-700">
                {log.verdict?.state === 'stuck'
                  ? 'The gravity is steady, but well above where this recipe should finish: the fermentation looks stuck, not finished. Sugar left in the beer can start fermenting again in the bottle and burst it.'
                  : `The verdict is “${log.verdict ? verdictTitles[log.verdict.state] : 'unknown'}”: the final gravity is not proven stable. Packaging now risks over-carbonated or bursting bottles.`}
              </p>
              <label className="flex min-h-touch cursor-pointer items-center gap-3 text-base">
                <OverrideCheckbox />
                {log.verdict?.state === 'stuck' ? 'Package anyway, although the gravity is well above the recipe’s' : 'Package anyway, before the gravity is stable'}
              </label>
              {errors.override && (
                <p role="alert" className="text-sm font-semibold text-alert-700">
                  {errors.override}
                </p>
              )}
              {values.override && <TextField name="overrideReason" label="Why? (your club mentor will see this)" maxLength={500} />}
            </div>
          )}
          <SaveNotice failure={status} busy={isSubmitting} onRetry={() => void submitForm()} />
          <Button type="submit" busy={isSubmitting} variant={stable ? 'primary' : 'danger'} className="w-full sm:w-auto">
            {stable ? 'Record packaging' : 'Record packaging anyway'}
          </Button>
        </Form>
      )}
    </Formik>
  );
}

function OverrideCheckbox() {
  const [field] = useField({ name: 'override', type: 'checkbox' });
  return <input type="checkbox" {...field} className="size-6 accent-alert-500" />;
}

function ContainerPicker() {
  const { values, setFieldValue } = useFormikContext<Values>();
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-semibold text-ink-soft">Into</legend>
      <div className="grid grid-cols-2 gap-2">
        {(['bottles', 'keg'] as const).map((c) => (
          <label
            key={c}
            className={`flex min-h-touch cursor-pointer items-center justify-center rounded-lg text-base font-semibold ring-1 ring-inset ${
              values.container === c ? 'bg-cellar-700 text-white ring-cellar-700' : 'bg-white text-cellar-700 ring-cellar-300'
            }`}
          >
            <input
              type="radio"
              className="sr-only"
              name="container"
              checked={values.container === c}
              onChange={() => {
                void setFieldValue('container', c);
                if (c === 'keg' && values.sugar !== 'none') void setFieldValue('sugar', 'none');
                if (c === 'bottles' && values.sugar === 'none') void setFieldValue('sugar', 'sucrose');
              }}
            />
            {c === 'bottles' ? 'Bottles' : 'Keg'}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

function SugarPicker() {
  const { values, handleChange } = useFormikContext<Values>();
  return (
    <div>
      <label htmlFor="packaging-sugar" className="mb-1 block text-sm font-semibold text-ink-soft">
        Priming sugar
      </label>
      <select id="packaging-sugar" name="sugar" value={values.sugar} onChange={handleChange} className="block min-h-touch w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base">
        {packagingSugars.map((s) => (
          <option key={s} value={s}>
            {packagingSugarLabels[s]}
          </option>
        ))}
      </select>
    </div>
  );
}

/** The same primingSugarG the server stores, run live. */
function SugarResult() {
  const { values } = useFormikContext<Values>();
  const units = useUnits();
  const co2 = typedNumber(values.targetCo2Volumes);
  let text: string | null = null;
  let problem: string | null = null;
  let residual: number | null = null;
  try {
    if (values.warmestTempC !== '' && typeof co2 === 'number' && Number.isFinite(co2)) residual = residualCo2Volumes(values.warmestTempC);
    if (values.sugar !== 'none' && values.volumeL !== '' && values.warmestTempC !== '' && typeof co2 === 'number' && Number.isFinite(co2)) {
      const grams = primingSugarG({ volumeL: values.volumeL, warmestTempC: values.warmestTempC, targetCo2Volumes: co2, sugar: values.sugar });
      text = units.format('smallMass', grams);
    }
  } catch (error) {
    if (error instanceof BrewMathError) problem = error.message;
    else throw error;
  }
  return (
    <div className="space-y-2">
      <div className="rounded-lg bg-cellar-50 p-3" aria-live="polite">
        <p className="text-sm font-semibold text-ink-soft">{values.sugar === 'none' ? 'No priming sugar' : `Priming sugar: ${packagingSugarLabels[values.sugar].toLowerCase()}`}</p>
        <p className="text-3xl font-bold tabular-nums text-cellar-900" data-testid="priming-grams">
          {values.sugar === 'none' ? '—' : (text ?? '—')}
        </p>
        {residual !== null && (
          <p className="text-sm text-ink-soft">The beer already holds about {residual.toFixed(2)} volumes of CO2 from fermentation; the sugar makes up the rest.</p>
        )}
        {problem && <p className="text-sm font-semibold text-alert-700">{problem}</p>}
      </div>
      {values.container === 'bottles' && typeof co2 === 'number' && co2 > BOTTLE_CO2_CAUTION_VOLUMES && (
        <Notice tone="caution">Ordinary bottles are not made for more than about {BOTTLE_CO2_CAUTION_VOLUMES} volumes of CO2: use heavy bottles rated for it, or a keg.</Notice>
      )}
    </div>
  );
}
