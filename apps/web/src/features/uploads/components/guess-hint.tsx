import type { MappingSetting, MappingSuggestion } from '@porestack/types';
import type { ReactNode } from 'react';

/**
 * What a setting of the mapping form rests on: the guess's reason ("From the header 'Zeit
 * [s]'"), or, for a setting the file does not tell, a request to choose it — so the person
 * confirms what was guessed and sees at once what is left.
 */
export function guessHint(suggestion: MappingSuggestion, setting: MappingSetting): ReactNode {
  if (suggestion.open.includes(setting)) return <span className="font-medium text-amber-800">The file does not tell: choose this.</span>;
  const reason = suggestion.reasons[setting];
  if (!reason) return undefined;
  return suggestion.source === 'guess' ? `Guessed: ${reason}` : reason;
}
