import type { TryFormText } from '@/components/try/try-form-values';

/** Where the try page leaves what was typed for a new account to pick up (this browser only). */
export const TRY_CARRY_STORAGE_KEY = 'pinwright.try-carry';

/** The storage, where there is one (the web; not in tests without it). */
function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

/**
 * Keeps the try page's text so that, once an account exists, the Bench offers
 * to make it the account's first bow and sight-in (components/try/keep-try-screen.tsx).
 * Only the visitor's own browser keeps it; nothing is sent until they save.
 * Example: saveTryCarry(text); loadTryCarry()?.nearReading → '14.9'
 */
export function saveTryCarry(text: TryFormText): void {
  storage()?.setItem(TRY_CARRY_STORAGE_KEY, JSON.stringify({ savedAt: new Date().toISOString(), text }));
}

/** What the try page kept, if anything with two readings was typed. */
export function loadTryCarry(): TryFormText | null {
  const raw = storage()?.getItem(TRY_CARRY_STORAGE_KEY);
  if (!raw) return null;
  try {
    const parsed = JSON.parse(raw) as { text?: TryFormText };
    const text = parsed.text;
    if (!text || typeof text.nearReading !== 'string' || typeof text.farReading !== 'string') return null;
    if (text.nearReading.trim() === '' || text.farReading.trim() === '') return null;
    return text;
  } catch {
    return null;
  }
}

/** Forgets it (once saved as a bow, or declined). */
export function clearTryCarry(): void {
  storage()?.removeItem(TRY_CARRY_STORAGE_KEY);
}
