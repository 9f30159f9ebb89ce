/**
 * The demo researcher's API key. It exists only in the demo database that the start command fills, so a
 * newcomer can try the API at once (the README's curl example uses it); never load the demo into a real
 * deployment.
 */
export const DEMO_API_KEY = 'cairn_demo_tollgate_lattice_key_2026';
export const DEMO_API_KEY_OWNER = 'tobias-quell';
