import { briefSchema, type BriefSchema } from '../brief/schema.js';
import type { BriefVocabulary } from '../brief/types.js';
import { supportedIntents } from '../choose/rules.js';
import { FORMS } from '../forms/registry.js';

const words = { intents: supportedIntents(), forms: FORMS.map((f) => f.name) };

/** The JSON Schema of a brief, as printed by `chartwright schema`: it offers only what is drawn. */
export const BRIEF_SCHEMA: BriefSchema = briefSchema(words);

/** What a brief may name today: the intents the rule table answers and the forms the registry draws (with their schema). */
export const VOCABULARY: BriefVocabulary = { ...words, schema: BRIEF_SCHEMA };
