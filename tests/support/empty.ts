// Stands in for the "server-only" marker package when tests import server modules directly.
export {};
