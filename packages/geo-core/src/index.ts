// The public surface of @porestack/geo-core: every export is listed by name.

// ── Laboratory: oedometer test reduction ─────────────────────────────────────

// ── Design: stresses, settlement, time rate, sizing, statistics, units ──────
