/** The build folder: the test command builds into its own so it never disturbs a running start command. */
export const distDirOf = (env: Record<string, string | undefined>): string => env.NEXT_DIST_DIR ?? ".next";
