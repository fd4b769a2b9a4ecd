/** Longest path accepted from or sent to the renderer (characters). */
export const IPC_PATH_CHARS = 4096;
