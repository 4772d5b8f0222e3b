// Shared test set-up: keep the app quiet and deterministic.
process.env.NEXT_TELEMETRY_DISABLED = "1";
