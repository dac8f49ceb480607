/** The tool's version, printed by --version and in every report. Keep in step with package.json. */
export const VERSION = '0.1.0';
