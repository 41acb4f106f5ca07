/** The tool's version, as recorded in run manifests; kept equal to package.json by a test. */
export const TOOL_VERSION = '0.1.0';
