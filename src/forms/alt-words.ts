import { format } from 'd3-format';
import { agree } from '../diagnostics/words.js';

/**
 * A chart's alt text in parts: what it is ("Bar chart of crossings per day by pier, 8 bars"),
 * its main reading ("largest North pier (212), smallest Dry dock landing (23)") and any further
 * sentences of its own. The pipeline joins them and adds the chart's notes (what was folded,
 * combined or left out); a panel of small multiples uses the reading alone.
 */
export interface AltText {
  what: string;
  reading: string;
  /** Further whole sentences, each ending in a full stop. Default: none. */
  more?: string[];
}

/** "1 bar", "2,630 values": a count with its digits grouped, as the chart writes counts, and its noun agreeing. */
export function count(n: number, noun: string, plural = `${noun}s`): string {
  return `${format(',')(n)} ${agree(n, noun, plural)}`;
}

/** The longest alt text written, in characters: past it, sentences are left out and the text says how many (common practice: screen-reader descriptions are read whole, so they stay short). */
export const MAX_ALT_CHARS = 600;

/** "what: reading." (or "what." with no reading), then the further sentences. */
export function altSentences(alt: AltText): string[] {
  return [alt.reading ? `${alt.what}: ${alt.reading}.` : `${alt.what}.`, ...(alt.more ?? [])];
}

/**
 * Sentences joined up to `max` characters; the first is always kept (shortened with "…" if it
 * alone is too long), and when any are left out the text ends by saying how many.
 */
export function capSentences(sentences: readonly string[], max = MAX_ALT_CHARS): string {
  const kept: string[] = [];
  let length = 0;
  for (const [i, s] of sentences.entries()) {
    const left = sentences.length - i - 1;
    const tail = left > 0 ? ` (${count(left + 1, 'more sentence')} left out.)`.length : 0;
    if (i > 0 && length + 1 + s.length + tail > max) {
      return `${kept.join(' ')} (${count(sentences.length - i, 'more sentence')} left out.)`;
    }
    kept.push(i === 0 && s.length > max ? `${s.slice(0, max - 1)}…` : s);
    length += (i > 0 ? 1 : 0) + kept[kept.length - 1]!.length;
  }
  return kept.join(' ');
}

/** A labelled value. */
export interface Labelled {
  label: string;
  value: number;
}

/** The largest and smallest of labelled values (first wins ties), or undefined when there are none. */
export function extremes<T extends Labelled>(items: readonly T[]): { top: T; low: T } | undefined {
  const finite = items.filter((i) => Number.isFinite(i.value));
  if (finite.length === 0) return undefined;
  return {
    top: finite.reduce((a, b) => (b.value > a.value ? b : a)),
    low: finite.reduce((a, b) => (b.value < a.value ? b : a)),
  };
}

/** "largest North (212), smallest South and West (64 each)": items tied at an end are all named (up to three, then counted); one value alone as "North (212)". */
export function extremesReading(items: readonly Labelled[], fmt: (n: number) => string, words: [string, string] = ['largest', 'smallest']): string {
  const e = extremes(items);
  if (!e) return '';
  if (e.top === e.low) return `${e.top.label} (${fmt(e.top.value)})`;
  if (e.top.value === e.low.value) return `all at ${fmt(e.top.value)}`;
  const at = (word: string, value: number) => {
    const names = items.filter((i) => i.value === value).map((i) => i.label);
    return names.length === 1 ? `${word} ${names[0]} (${fmt(value)})` : `${word} ${someNames(names, 3)} (${fmt(value)} each)`;
  };
  return `${at(words[0], e.top.value)}, ${at(words[1], e.low.value)}`;
}

/**
 * A relative change in percent as a reader says it: whole percents from 100 up, two significant
 * digits below (never "0" for a change that is not zero), or undefined where a percent means
 * nothing (from zero or across zero).
 */
export function percentChange(from: number, to: number): string | undefined {
  if (from <= 0 || to < 0 || !Number.isFinite(from) || !Number.isFinite(to)) return undefined;
  const p = Math.abs(((to - from) / from) * 100);
  if (p === 0) return undefined;
  return `${p >= 100 ? format(',.0f')(p) : format('.2~r')(p)}%`;
}

/** The verb of a change from first to last: by the sign of last − first. */
export function changeVerb(first: number, last: number, up = 'rose', down = 'fell'): string {
  return last > first ? up : last < first ? down : 'was unchanged';
}

/** One point of a trend: its value and where it is on the key, named. */
export interface TrendPoint {
  value: number;
  at: string;
}

/**
 * "rose 42% from 1,200 in Jan 2024 to 1,704 in Dec 2025, peaking at 1,910 in Aug 2025": the
 * direction by the sign of last − first, the percent where it means something, and the peak when
 * it is neither end.
 */
export function trendReading(first: TrendPoint, last: TrendPoint, peak: TrendPoint | undefined, fmt: (n: number) => string): string {
  const verb = changeVerb(first.value, last.value);
  if (verb === 'was unchanged') return `was unchanged at ${fmt(first.value)} from ${first.at} to ${last.at}`;
  const pct = percentChange(first.value, last.value);
  const peakText = peak && peak.value > Math.max(first.value, last.value) ? `, peaking at ${fmt(peak.value)} in ${peak.at}` : '';
  return `${verb}${pct ? ` ${pct}` : ''} from ${fmt(first.value)} in ${first.at} to ${fmt(last.value)} in ${last.at}${peakText}`;
}

/** Up to `most` names, then "and N more": "A, B and 3 more". */
export function someNames(names: readonly string[], most = 4): string {
  if (names.length <= most) return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
  return `${names.slice(0, most).join(', ')} and ${names.length - most} more`;
}

/** How strong a correlation is, in words (common practice: |r| from 0.7 strong, from 0.4 moderate, from 0.2 weak). */
export function strengthWord(r: number): string {
  const a = Math.abs(r);
  const sign = r < 0 ? 'negative' : 'positive';
  if (a >= 0.7) return `strong ${sign}`;
  if (a >= 0.4) return `moderate ${sign}`;
  if (a >= 0.2) return `weak ${sign}`;
  return 'little or no';
}
