// vitest and the CLI run outside Next's server bundle, where "server-only" has no meaning.
export {};
