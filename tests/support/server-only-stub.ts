// vitest runs server modules outside Next; 'server-only' has no meaning there.
export {};
