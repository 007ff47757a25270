/** Version of `@skyledger/calc`, recorded in every result; a test keeps it equal to package.json. */
export const libraryVersion = '0.1.0';
