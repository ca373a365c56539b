/** Stored with every assessment so a change of method can be told apart from a change of input. */
export const ENGINE_VERSION = '2026.12.7';
