export * from './ingredient.js';
export * from './bakers-percentages.js';
export * from './final-dough.js';
export * from './scaling.js';
export * from './flour-blend.js';
export * from './ice.js';
export * from './ddt.js';
