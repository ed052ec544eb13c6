/** The project model: types, defaults, validation, file read/write, units. */
export * from './types';
export * from './defaults';
export * from './validate';
export * from './project-file';
export * from './units';
export * from './caution';
export * from './migrate';
export * from './specimens-csv';
