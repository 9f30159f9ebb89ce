// Filled by the server work; see apps/server.
export {};
