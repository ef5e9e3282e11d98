// rate-limiter-flexible documents RateLimiterStoreAbstract as the base of any new store but exports
// only its type from the package root; the class itself is this CommonJS file.
declare module 'rate-limiter-flexible/lib/RateLimiterStoreAbstract.js' {
	import type { RateLimiterStoreAbstract } from 'rate-limiter-flexible';
	const StoreAbstract: typeof RateLimiterStoreAbstract;
	export default StoreAbstract;
}
