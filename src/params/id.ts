import type { ParamMatcher } from '@sveltejs/kit';

/** Database ids: positive integers that fit in an unsigned INT. */
export const match: ParamMatcher = (param) => /^[1-9]\d{0,9}$/.test(param) && Number(param) <= 4294967295;
