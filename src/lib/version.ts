import pkg from '../../package.json';

/** The application version, from package.json. */
export const APP_VERSION: string = pkg.version;
