export * from './model-site';
export { SITE_CAUTIONS } from './cautions';
