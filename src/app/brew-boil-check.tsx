import { useRef, useState } from 'react';
import type { BrewDetail, DecisionChoice } from '@shared/schemas/brews';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';
import type { LateBoilInitialValues } from '@/features/late-boil/components/form-values';
import { LateBoilCheck, type LateBoilChoice } from '@/features/late-boil/components/late-boil-check';
import { useAddDecision } from '@/features/brews/api/add-decision';
import { DecisionExtras, DecisionReason } from '@/features/brews/components/decision-extras';

const toChoice = (option: LateBoilChoice['option']): DecisionChoice =>
  option.kind === 'extract' ? { kind: 'extract', extract: option.extract } : { kind: option.kind };

/**
 * The boil stage's late-boil check, whose chosen option (or the brewer's own action) is saved as a
 * decision with its reason. Its own chunk: the page loads it only when the boil stage is shown.
 */
export function BrewBoilCheck({ brew, initialValues }: { brew: BrewDetail; initialValues: LateBoilInitialValues | undefined }) {
  const addDecision = useAddDecision(brew.id);
  const reason = useRef('');
  const [checkKey, setCheckKey] = useState(0);
  const saveDecision = (input: BoilCheckParsed, choice: DecisionChoice) => addDecision.mutateAsync({ input, choice, note: reason.current });
  return (
    <>
      <LateBoilCheck
        key={checkKey}
        initialValues={initialValues}
        recipe={brew.targets}
        onChoose={({ option, input }) => saveDecision(input, toChoice(option))}
        renderBeforeOptions={() => <DecisionReason initial={reason.current} onReasonChange={(text) => (reason.current = text)} />}
        renderAfterOptions={(check) => (
          <DecisionExtras
            ready={check !== null}
            onOwnAction={(description) => (check ? saveDecision(check.input, { kind: 'own', description }) : Promise.resolve())}
          />
        )}
      />
      <button type="button" className="no-print min-h-touch text-sm font-semibold text-cellar-700 underline" onClick={() => setCheckKey((k) => k + 1)}>
        Start a fresh check
      </button>
    </>
  );
}
