// The engine's file formats: readers and writers over strings and bytes (no file system here).
export {};
