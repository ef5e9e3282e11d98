export * from './model-site';
