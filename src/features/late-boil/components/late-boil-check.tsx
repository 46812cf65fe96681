import { lazy, memo, Suspense, useCallback, useDeferredValue, useEffect, useMemo, useReducer, useRef, useState, type ReactNode } from 'react';
import { ArrowDown, ChevronRight } from 'lucide-react';
import type { BalanceRecipe, BoilCheckOutcome, FeasibleOption } from '@shared/boil-check';
import { gapInWords, optionAction } from '@shared/boil-check/words';
import { EXTRACT_KINDS, EXTRACT_POTENTIALS_POINTS_L_PER_KG, KG_PER_LB, LITRES_PER_US_GALLON, type ExtractKind } from '@shared/brewmath';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';
import { Notice } from '@/components/ui/notice';
import { useUnits, type Units } from '@/lib/units';
import { CheckSummary, NotReady, optionKey, orderedOptions, type ChoiceState } from './check-summary';
import { CheckNumberField, CheckQuantityField, type SetValue, type Touch } from './check-fields';
import { evaluate, toFormValues, type Check, type LateBoilFormValues, type LateBoilInitialValues, type NumberValue, type ReadingKind } from './form-values';

export interface LateBoilChoice {
  /** The option the brewer picked, exactly as the check produced it. */
  option: FeasibleOption;
  /** Everything the brewer entered, parsed (SI): what the server recomputes from. */
  input: BoilCheckParsed;
  /** The whole check as it stood when the brewer chose. */
  result: BoilCheckOutcome;
}

export interface LateBoilCheckProps {
  /** Prefill, all SI: a brew day's snapshot targets and equipment profile. */
  initialValues?: LateBoilInitialValues;
  /** Show and read numbers in these units instead of the signed-in brewer's. */
  units?: Units;
  /**
   * Called when the brewer picks an option. Return a promise to show saving, saved or a
   * "Not saved" message with a retry: what the brewer typed is kept either way.
   * Without it, the nudge is shown in place of the "Choose this" buttons.
   */
  onChoose?: (choice: LateBoilChoice) => Promise<unknown> | void;
  /** Shown below the options when there is no onChoose (the public page's sign-up invitation). */
  nudge?: ReactNode;
  /** Rendered after the options, with the current check (or null while it cannot run). */
  renderAfterOptions?: (check: { input: BoilCheckParsed; result: BoilCheckOutcome } | null) => ReactNode;
  /** Rendered between the answer and the option cards while there are options to choose from. */
  renderBeforeOptions?: () => ReactNode;
  /** The recipe's hops, grist and targets (a brew day's snapshot): each option then shows its bitterness and colour. */
  recipe?: BalanceRecipe;
}

// The option cards are most of the answer's code and are needed only once a reading is complete:
// their chunk is fetched when the brewer starts on the form (or a prefilled check is complete).
const loadOptions = () => import('./check-results');
const CheckOptions = lazy(() => loadOptions().then((m) => ({ default: m.CheckOptions })));

const extractLabels: Record<(typeof EXTRACT_KINDS)[number], string> = {
  dme: 'Dry malt extract',
  lme: 'Liquid malt extract',
  sucrose: 'Table sugar',
  dextrose: 'Dextrose',
};

/**
 * The late-boil check: the brewer enters a reading about ten minutes before the end of the boil
 * and sees, as they type, where the wort is heading and what to do about it. Everything is
 * worked out in the browser with the shared brewing math, so it keeps working on a lost connection.
 */
export function LateBoilCheck({ units, ...props }: LateBoilCheckProps) {
  const userUnits = useUnits();
  return <CheckForm {...props} units={units ?? userUnits} />;
}

/**
 * The form and its answer: what renders on each keystroke. The signed-in user's units are read
 * once, above it, so a keystroke does not run the session query's hook again.
 */
function CheckForm({ initialValues, units, onChoose, nudge, renderAfterOptions, renderBeforeOptions, recipe }: Omit<LateBoilCheckProps, 'units'> & { units: Units }) {
  // Later changes to initialValues are ignored, as a form's starting values are: what is typed stays.
  const [state, dispatch] = useReducer(reducer, initialValues, (initial): FormState => ({ values: toFormValues(initial), touched: {} }));
  // Checked once per change: the verdict under each field and the answer come from this one run.
  const { check, errors } = useMemo(() => evaluate(state.values, units.unitSystem), [state.values, units.unitSystem]);
  const onValue = useCallback<SetValue>((name, value) => dispatch({ type: 'set', name, value }), []);
  const onTouch = useCallback<Touch>((name) => dispatch({ type: 'touch', name }), []);
  const inputsRef = useRef<HTMLDivElement>(null);
  const shownErrors: Partial<Record<string, string>> = {};
  for (const [name, message] of Object.entries(errors)) if (state.touched[name] || state.touched['*']) shownErrors[name] = message;
  return (
    <form
      noValidate
      aria-label="Late-boil check"
      onFocus={() => void loadOptions()}
      onSubmit={(e) => {
        // Enter in a field: nothing to send, but every message is shown, as on a form's submit.
        e.preventDefault();
        dispatch({ type: 'touch', name: '*' });
      }}
    >
      <div className="grid gap-4 pb-20 lg:grid-cols-2 lg:items-start lg:pb-0">
        <div ref={inputsRef} className="min-w-0">
          <Inputs values={state.values} errors={shownErrors} units={units} onValue={onValue} onTouch={onTouch} dispatch={dispatch} />
        </div>
        <div className="lg:sticky lg:top-4">
          <Answer check={check} units={units} inputsRef={inputsRef} onChoose={onChoose} nudge={nudge} renderAfterOptions={renderAfterOptions} renderBeforeOptions={renderBeforeOptions} recipe={recipe} />
        </div>
      </div>
    </form>
  );
}

interface FormState {
  values: LateBoilFormValues;
  /** Fields the brewer changed or left: their messages show at once, not only on blur ('*': all of them). */
  touched: Partial<Record<string, true>>;
}

type FormAction =
  | { type: 'set'; name: string; value: NumberValue }
  | { type: 'kind'; kind: ReadingKind }
  | { type: 'extract'; kind: ExtractKind; on: boolean }
  | { type: 'touch'; name: string };

function setIn<T>(target: T, path: string[], value: unknown): T {
  const [key, ...rest] = path;
  const node = target as Record<string, unknown>;
  return { ...node, [key]: rest.length === 0 ? value : setIn(node[key], rest, value) } as T;
}

function getIn(target: unknown, path: string[]): unknown {
  return path.reduce<unknown>((node, key) => (node as Record<string, unknown> | undefined)?.[key], target);
}

function reducer(state: FormState, action: FormAction): FormState {
  switch (action.type) {
    case 'set': {
      const path = action.name.split('.');
      if (Object.is(getIn(state.values, path), action.value)) return state;
      return { values: setIn(state.values, path, action.value), touched: { ...state.touched, [action.name]: true } };
    }
    case 'kind':
      if (state.values.reading.kind === action.kind) return state;
      return { ...state, values: setIn(state.values, ['reading', 'kind'], action.kind) };
    case 'extract': {
      const now = state.values.extractsOnHand;
      const next = action.on ? (now.includes(action.kind) ? now : [...now, action.kind]) : now.filter((k) => k !== action.kind);
      return { ...state, values: { ...state.values, extractsOnHand: next } };
    }
    case 'touch':
      return state.touched[action.name] ? state : { ...state, touched: { ...state.touched, [action.name]: true } };
  }
}

// Static parts, made once: React skips an element it has already rendered, and the icons in
// them are costly to build again on each keystroke of a throttled phone.
const hotWortCaution = (
  <Notice tone="caution" title="Hot wort and steam burn">
    Take the sample with a long spoon or a sampling tube, keep your face out of the steam, and let the drop cool before you read it.
  </Notice>
);

const moreSettingsSummary = (
  <summary className="flex min-h-touch cursor-pointer list-none items-center gap-1 font-semibold text-cellar-700 [&::-webkit-details-marker]:hidden">
    <ChevronRight aria-hidden className="size-5 transition-transform group-open:rotate-90" />
    More settings: FG, kettle size and losses, shrinkage, potentials
  </summary>
);

const allOptionsLabel = (
  <>
    All options <ArrowDown aria-hidden className="size-4" />
  </>
);

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="min-w-0 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <legend className="float-left mb-3 w-full text-lg font-bold text-cellar-900">{title}</legend>
      <div className="clear-both space-y-4">{children}</div>
    </fieldset>
  );
}

// The radios and checkboxes are memoised apart from the number fields: React writes an input's
// name and type again whenever it renders it, so rendering them on each keystroke costs DOM work.
const ReadingKindChoice = memo(function ReadingKindChoice({ kind: value, dispatch }: { kind: ReadingKind; dispatch: (action: FormAction) => void }) {
  return (
    <div role="radiogroup" aria-label="Read with" className="grid grid-cols-2 gap-2">
      {(
        [
          ['refractometer', 'Refractometer'],
          ['hydrometer', 'Hydrometer (cooled sample)'],
        ] as const
      ).map(([kind, label]) => (
        <label
          key={kind}
          className={`flex min-h-touch cursor-pointer items-center justify-center rounded-lg px-2 py-2 text-center text-sm font-semibold ring-1 ${value === kind ? 'bg-cellar-700 text-white ring-cellar-700' : 'bg-white text-cellar-700 ring-cellar-300'}`}
        >
          <input type="radio" name="reading.kind" value={kind} checked={value === kind} onChange={() => dispatch({ type: 'kind', kind })} className="sr-only" />
          {label}
        </label>
      ))}
    </div>
  );
});

const ExtractsOnHand = memo(function ExtractsOnHand({ onHand, dispatch }: { onHand: ExtractKind[]; dispatch: (action: FormAction) => void }) {
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-semibold text-ink-soft">Extracts on hand</legend>
      <div className="grid grid-cols-2 gap-2">
        {EXTRACT_KINDS.map((kind) => (
          <label key={kind} className="flex min-h-touch cursor-pointer items-center gap-2 rounded-lg px-2 ring-1 ring-cellar-100">
            <input
              type="checkbox"
              name="extractsOnHand"
              value={kind}
              checked={onHand.includes(kind)}
              onChange={(e) => dispatch({ type: 'extract', kind, on: e.target.checked })}
              className="size-5 accent-cellar-700"
            />
            <span className="text-sm">{extractLabels[kind]}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
});

interface InputsProps {
  values: LateBoilFormValues;
  errors: Partial<Record<string, string>>;
  units: Units;
  onValue: SetValue;
  onTouch: Touch;
  dispatch: (action: FormAction) => void;
}

function Inputs(props: InputsProps) {
  return (
    <div className="min-w-0 space-y-4">
      {hotWortCaution}
      <ReadingPanel {...props} />
      <KettlePanel {...props} />
      <TargetPanel {...props} />
    </div>
  );
}

/**
 * Each panel renders again only when one of its own fields changed (value or message), so a
 * keystroke renders the panel typed in, not the whole form. Each field is memoised too: only the
 * one whose value or message changed renders again.
 */
function samePanel(names: readonly string[]) {
  const fields = names.map((name) => [name, name.split('.')] as const);
  return (prev: InputsProps, next: InputsProps) =>
    prev.units === next.units &&
    prev.onValue === next.onValue &&
    prev.onTouch === next.onTouch &&
    prev.dispatch === next.dispatch &&
    fields.every(([name, path]) => Object.is(getIn(prev.values, path), getIn(next.values, path)) && prev.errors[name] === next.errors[name]);
}

function fieldProps({ values, errors, onValue, onTouch }: InputsProps, name: string) {
  return { name, value: getIn(values, name.split('.')) as NumberValue, error: errors[name], onValue, onTouch };
}

const ReadingPanel = memo(function ReadingPanel(props: InputsProps) {
  const { values, units, dispatch } = props;
  const field = (name: string) => fieldProps(props, name);
  const hydrometer = values.reading.kind === 'hydrometer';
  return (
    <Panel title="Reading">
      <ReadingKindChoice kind={values.reading.kind} dispatch={dispatch} />
      {hydrometer ? (
        <>
          <p className="text-sm text-ink-soft">A hydrometer cannot be read in hot wort: cool a sample in a covered jar first.</p>
          <CheckQuantityField {...field('reading.sg')} kind="gravity" label="Hydrometer reading" size="large" units={units} />
          <div className="grid grid-cols-2 gap-3">
            <CheckQuantityField {...field('reading.sampleTempC')} kind="temperature" label="Sample temperature" units={units} />
            <CheckQuantityField {...field('reading.calibrationTempC')} kind="temperature" label="Calibrated at" units={units} />
          </div>
        </>
      ) : (
        <div className="grid grid-cols-[minmax(0,3fr)_minmax(0,2fr)] gap-3">
          <CheckNumberField {...field('reading.brix')} label="Brix" unit="°Bx" size="large" />
          <CheckNumberField {...field('reading.wcf')} label="Wort correction factor" hint="About 1.04 is common." />
        </div>
      )}
    </Panel>
  );
}, samePanel(['reading.kind', 'reading.brix', 'reading.wcf', 'reading.sg', 'reading.sampleTempC', 'reading.calibrationTempC']));

const KettlePanel = memo(function KettlePanel(props: InputsProps) {
  const { units } = props;
  const field = (name: string) => fieldProps(props, name);
  return (
    <Panel title="Kettle now">
      <CheckQuantityField {...field('volumeL')} kind="volume" label="Wort in the kettle (hot)" size="large" units={units} />
      <div className="grid grid-cols-2 gap-3">
        <CheckNumberField {...field('minutesLeft')} label="Minutes left" unit="min" />
        <CheckQuantityField {...field('boilOffLPerHour')} kind="rate" label="Boil-off rate" units={units} />
      </div>
    </Panel>
  );
}, samePanel(['volumeL', 'minutesLeft', 'boilOffLPerHour']));

const TargetPanel = memo(function TargetPanel(props: InputsProps) {
  const { values, units, dispatch } = props;
  const field = (name: string) => fieldProps(props, name);
  // Potentials read in points per pound per US gallon in US units: 1 ppg = 8.3454 points·L/kg.
  const ppgScale = KG_PER_LB / LITRES_PER_US_GALLON;
  const us = units.unitSystem === 'us';
  return (
    <Panel title="Recipe target">
      <div className="grid grid-cols-2 gap-3">
        <CheckQuantityField {...field('targetSg')} kind="gravity" label="Target OG" units={units} />
        <CheckQuantityField {...field('targetVolumeL')} kind="volume" label="Into the fermenter" hint="Optional" units={units} />
      </div>
      <ExtractsOnHand onHand={values.extractsOnHand} dispatch={dispatch} />
      <details className="group">
        {moreSettingsSummary}
        <div className="mt-2 space-y-4">
          <div className="grid grid-cols-2 gap-3">
            <CheckQuantityField {...field('targetFg')} kind="gravity" label="Target FG" hint="For ABV; optional" units={units} />
            <CheckQuantityField {...field('kettleCapacityL')} kind="volume" label="Kettle size" hint="Optional" units={units} />
          </div>
          <div className="grid grid-cols-2 gap-3">
            <CheckNumberField {...field('coolingShrinkage')} label="Shrinkage on cooling" unit="%" scale={100} hint="Hot wort is about 4 % bigger than cold." />
            <CheckQuantityField {...field('kettleLossL')} kind="volume" label="Left in the kettle" hint="Trub loss plus dead space" units={units} />
          </div>
          <fieldset>
            <legend className="mb-1 text-sm font-semibold text-ink-soft">Extract potentials, if yours differ ({us ? 'points per lb per gallon' : 'points × litres per kg'})</legend>
            <div className="grid grid-cols-2 gap-3">
              {EXTRACT_KINDS.map((kind) => (
                <CheckNumberField
                  key={kind}
                  {...field(`potentials.${kind}`)}
                  label={extractLabels[kind]}
                  unit={us ? 'ppg' : 'pts·L/kg'}
                  scale={us ? ppgScale : 1}
                  placeholder={(EXTRACT_POTENTIALS_POINTS_L_PER_KG[kind] * (us ? ppgScale : 1)).toFixed(0)}
                />
              ))}
            </div>
          </fieldset>
        </div>
      </details>
    </Panel>
  );
}, samePanel(['targetSg', 'targetVolumeL', 'extractsOnHand', 'targetFg', 'kettleCapacityL', 'coolingShrinkage', 'kettleLossL', ...EXTRACT_KINDS.map((kind) => `potentials.${kind}`)]));

/**
 * The answer beside (or, on a phone, below) the inputs. The summary of where the wort is heading
 * follows each keystroke at once; the option cards, the costly part, follow a deferred copy of the
 * check, so React can paint the new figures first and fill in the cards right after.
 */
const Answer = memo(function Answer({
  check,
  units,
  inputsRef,
  onChoose,
  nudge,
  renderAfterOptions,
  renderBeforeOptions,
  recipe,
}: Pick<LateBoilCheckProps, 'onChoose' | 'nudge' | 'renderAfterOptions' | 'renderBeforeOptions' | 'recipe'> & {
  check: Check;
  units: Units;
  inputsRef: React.RefObject<HTMLElement | null>;
}) {
  const deferred = useDeferredValue(check);
  const [choice, setChoice] = useState<ChoiceState | null>(null);
  const mounted = useRef(true);
  useEffect(() => {
    mounted.current = true;
    return () => {
      mounted.current = false;
    };
  }, []);

  const choose = useCallback(
    async (option: FeasibleOption) => {
      // The cards show the deferred check: a choice is saved with the check it was made from.
      if (!onChoose || !deferred.ok) return;
      const key = optionKey(option);
      setChoice({ key, state: 'saving' });
      try {
        const saved = await onChoose({ option, input: deferred.input, result: deferred.outcome });
        // A brew day without a connection keeps the decision on the device until it can be sent.
        const queued = typeof saved === 'object' && saved !== null && (saved as { status?: unknown }).status === 'queued';
        if (mounted.current) setChoice({ key, state: 'saved', message: queued ? 'Kept on this device: waiting to send.' : undefined });
      } catch (error) {
        if (mounted.current) setChoice({ key, state: 'failed', message: (error as Error).message });
      }
    },
    [onChoose, deferred],
  );
  // Stable between keystrokes that do not change the check, so the memoised results skip those renders.
  const onPick = useMemo(() => (onChoose ? (o: FeasibleOption) => void choose(o) : undefined), [onChoose, choose]);
  // Rendered once per renderBeforeOptions, so the memoised cards are not rendered again for it on each keystroke.
  const beforeOptions = useMemo(() => renderBeforeOptions?.(), [renderBeforeOptions]);

  const resultsRef = useRef<HTMLDivElement>(null);
  const answerBelow = useAnswerBelowInputs(inputsRef, resultsRef);

  return (
    <div className="min-w-0 space-y-4">
      <div ref={resultsRef} id="late-boil-answer" className="scroll-mt-4">
        {check.ok ? (
          <div className="space-y-4">
            <CheckSummary input={check.input} outcome={check.outcome} units={units} recipe={recipe} />
            {deferred.ok && (
              <Suspense fallback={null}>
                <CheckOptions input={deferred.input} outcome={deferred.outcome} units={units} choice={choice} onChoose={onPick} beforeOptions={beforeOptions} recipe={recipe} />
              </Suspense>
            )}
          </div>
        ) : (
          <NotReady missing={check.missing} problems={check.problems} />
        )}
      </div>
      {check.ok && answerBelow && <AnswerBar outcome={check.outcome} units={units} onShow={() => resultsRef.current?.scrollIntoView({ behavior: 'smooth' })} />}
      {renderAfterOptions?.(check.ok ? { input: check.input, result: check.outcome } : null)}
      {!onChoose && nudge}
    </div>
  );
});

/**
 * True while the brewer is typing in the inputs and the answer is still below the screen (a
 * phone); false where the browser cannot tell, so nothing extra is shown there.
 */
function useAnswerBelowInputs(inputsRef: React.RefObject<HTMLElement | null>, resultsRef: React.RefObject<HTMLElement | null>): boolean {
  const [seen, setSeen] = useState({ inputs: false, resultsBelow: false });
  useEffect(() => {
    const inputs = inputsRef.current;
    const results = resultsRef.current;
    if (!inputs || !results || typeof IntersectionObserver === 'undefined') return;
    const observer = new IntersectionObserver((entries) => {
      setSeen((prev) => {
        const next = { ...prev };
        for (const entry of entries) {
          if (entry.target === inputs) next.inputs = entry.isIntersecting;
          else next.resultsBelow = !entry.isIntersecting && entry.boundingClientRect.top > 0;
        }
        return next;
      });
    });
    observer.observe(inputs);
    observer.observe(results);
    return () => observer.disconnect();
  }, [inputsRef, resultsRef]);
  return seen.inputs && seen.resultsBelow;
}

/**
 * On a phone the answer sits below the inputs; while it is off screen this bar at the bottom
 * shows the gap and the first thing to do, so the brewer sees it change as they type.
 */
function AnswerBar({ outcome, units, onShow }: { outcome: BoilCheckOutcome; units: Units; onShow: () => void }) {
  const first = orderedOptions(outcome.result)[0];
  return (
    <div className="fixed inset-x-0 bottom-0 z-10 border-t border-cellar-900 bg-cellar-900 px-3 py-2 text-white shadow-lg lg:hidden" data-testid="answer-bar">
      <div className="mx-auto flex max-w-5xl items-center gap-3">
        <div className="min-w-0 flex-1" aria-live="polite">
          <p className="text-sm text-cellar-100">{gapInWords(outcome.result, units.gravityUnit)}</p>
          {first && <p className="text-lg font-bold leading-tight">{optionAction(first, units.unitSystem)}</p>}
        </div>
        <button type="button" onClick={onShow} className="flex min-h-touch shrink-0 items-center gap-1 rounded-lg bg-white px-3 font-semibold text-cellar-900">
          {allOptionsLabel}
        </button>
      </div>
    </div>
  );
}

