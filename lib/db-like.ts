// A user's text inside a SQL LIKE pattern: its own % and _ match themselves, not "anything".
export const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);
