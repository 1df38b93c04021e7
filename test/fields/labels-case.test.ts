import { describe, expect, it } from 'vitest';
import { inSentence, readableName } from '../../src/fields/labels.js';

// Issue 6: descriptions lower-cased the whole label ("ph", "q1 2023", "°c"), and column names were title-cased blindly ("Gdp", "Sku").
describe('labels keep the case they were written in', () => {
  it.each([
    ['Crossings per day', 'crossings per day'],
    ['Net inflow (m³)', 'net inflow (m³)'],
    ['pH', 'pH'],
    ['Q1 2023', 'Q1 2023'],
    ['GDP per head', 'GDP per head'],
    ['CO2 (ppm)', 'CO2 (ppm)'],
    ['May and September (°C)', 'May and September (°C)'],
    ['Index, Q1 2023 = 100', 'index, Q1 2023 = 100'],
    ['Water Temperature', 'water Temperature'],
    ['Sept rainfall', 'Sept rainfall'],
    ['Mon to Fri crossings', 'Mon to Fri crossings'],
    ['Okt. 2026 takings', 'Okt. 2026 takings'], // a German date label (locale: de) keeps its capital too
    ['März to Mai', 'März to Mai'],
  ])('in a sentence, %j reads %j', (label, sentence) => {
    expect(inSentence(label)).toBe(sentence);
  });

  it.each([
    ['crossings_per_day', 'Crossings per day'],
    ['rain_mm', 'Rain mm'],
    ['loanCount', 'Loan count'],
    ['GDP', 'GDP'],
    ['pH', 'pH'],
    ['CO2', 'CO2'],
    ['co2_ppm', 'co2 ppm'], // a first word with digits is kept as written
    ['iPhoneSales', 'iPhone sales'],
    ['totalGDP', 'Total GDP'],
    ['GDP_per_capita', 'GDP per capita'],
    ['sku', 'sku'],
    ['pier', 'Pier'],
    ['jan', 'Jan'], // month and weekday names are names, not abbreviations kept as written
    ['mon', 'Mon'],
  ])('the column %j reads %j', (name, label) => {
    expect(readableName(name)).toBe(label);
  });

  it('never lowers a capital letter of a column name, but for the first letter of a camelCase word', () => {
    for (const name of ['GDP', 'pH', 'CO2', 'NOx_level', 'Q1_sales', 'iPhone', 'EU-27', 'CO2_ppm']) {
      const capitals = [...name].filter((c) => c !== c.toLowerCase());
      const kept = [...readableName(name)].filter((c) => c !== c.toLowerCase());
      expect(kept).toEqual(capitals);
    }
  });
});
