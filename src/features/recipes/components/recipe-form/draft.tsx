import { useFormikContext } from 'formik';
import { useEffect } from 'react';
import type { RecipeFormValues } from './form-values';

/**
 * An unsaved recipe survives a reload: the form's values are kept in this browser's localStorage,
 * one draft per recipe (and one for a new recipe), until a save succeeds or the author discards it.
 * A draft of an older version than the one stored is not offered (the recipe moved on).
 */
export function recipeDraftKey(recipeId: number | undefined) {
  return `wortwise:recipe-draft:${recipeId ?? 'new'}`;
}

/**
 * This tab's id, kept in sessionStorage (it survives a reload, not a new tab): a draft comes back
 * by itself only in the tab that wrote it; another tab is offered it instead of having it forced on it.
 */
export function currentTabId(): string {
  try {
    const existing = globalThis.sessionStorage?.getItem('wortwise:tab');
    if (existing) return existing;
    const id = Math.random().toString(36).slice(2);
    globalThis.sessionStorage?.setItem('wortwise:tab', id);
    return id;
  } catch {
    return 'no-session-storage';
  }
}

export interface StoredDraft {
  tabId?: string;
  version: number;
  savedAt: string;
  values: RecipeFormValues;
}

export function readRecipeDraft(recipeId: number | undefined, version: number): StoredDraft | null {
  try {
    const raw = globalThis.localStorage?.getItem(recipeDraftKey(recipeId));
    if (!raw) return null;
    const draft = JSON.parse(raw) as StoredDraft;
    if (draft.version !== version || typeof draft.values !== 'object' || draft.values === null) return null;
    return draft;
  } catch {
    return null;
  }
}

export function clearRecipeDraft(recipeId: number | undefined) {
  try {
    globalThis.localStorage?.removeItem(recipeDraftKey(recipeId));
  } catch {
    // Storage unavailable (private mode): nothing was kept.
  }
}

/** Inside the Formik form: writes the values a moment after each change. */
export function RecipeDraftKeeper({ recipeId, version }: { recipeId: number | undefined; version: number }) {
  const { values, dirty } = useFormikContext<RecipeFormValues>();
  useEffect(() => {
    if (!dirty) return;
    const timer = setTimeout(() => {
      try {
        const draft: StoredDraft = { tabId: currentTabId(), version, savedAt: new Date().toISOString(), values };
        globalThis.localStorage?.setItem(recipeDraftKey(recipeId), JSON.stringify(draft));
      } catch {
        // Quota or private mode: the form still works, only the draft is not kept.
      }
    }, 300);
    return () => clearTimeout(timer);
  }, [values, dirty, recipeId, version]);
  return null;
}
