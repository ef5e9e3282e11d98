/** Custom systems: the search for the cheapest clear systems in stock. Pure: no I/O. */
export { searchSystems, suggestSystemsNow, DEFAULT_BUDGET_MS, MAX_SYSTEMS, type Candidate, type Obstacles, type SearchResult, type SearchOptions } from './search';
export { chainsOf, dayCost, groupOf, unitsOverStock, type Chain, type StockCatalogue } from './chains';
