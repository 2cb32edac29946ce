/** The concept schemas shared by content frontmatter, API bodies and editor forms. */
export * from './transfer-function';
export * from './controller';
export * from './process-model';
export * from './claim';
export * from './block';
