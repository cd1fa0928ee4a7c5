/**
 * Version of the geo-core calculations, stored beside every analysis so a
 * reported value can be traced to the code that produced it. Kept equal to
 * the package version; raise it whenever a method or default changes a result.
 */
export const GEO_CORE_VERSION = '0.2.0';
