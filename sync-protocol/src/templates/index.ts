export * from './cautions.js';
export * from './launch-template.js';
export * from './stow-template.js';
