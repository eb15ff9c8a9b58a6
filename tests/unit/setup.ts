// Unit tests run without a database; "server-only" modules are resolved to an empty stub.
export {};
