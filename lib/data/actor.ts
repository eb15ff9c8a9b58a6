/** The signed-in user on whose behalf a data function runs. Every data function takes one. */
export type Actor = { userId: string };
