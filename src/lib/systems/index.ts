/** Custom systems: the search for the cheapest clear systems in stock. Pure: no I/O. */
export { searchSystems, suggestSystemsNow, searchBudgetMs, DEFAULT_BUDGET_MS, MAX_SYSTEMS, type Candidate, type Obstacles, type SearchResult, type SearchOptions } from './search';
export { chainsOf, dayCost, groupOf, unitsOverStock, MIN_PATTERN_CABINETS, type Chain, type GroupPattern, type StockCatalogue } from './chains';
