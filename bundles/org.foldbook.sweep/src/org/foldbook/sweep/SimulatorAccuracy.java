package org.foldbook.sweep;

/**
 * The band in which a sweep mode simulates faithfully, stated with every result.
 *
 * @param upToNewRateFraction for the digital modes, the band as a fraction of each new rate (NaN otherwise)
 * @param upToHz              for the source-rate modes, the band in Hz (NaN otherwise)
 * @param levelDb             the error level (bare: the sampler's error re a component) or the level down to
 *                            which the response holds (modelled), or the stop-band depth (digital modes), dB
 * @param statement           the same in words
 */
public record SimulatorAccuracy(double upToNewRateFraction, double upToHz, double levelDb, String statement) {
    public SimulatorAccuracy {
        if (statement == null || statement.isBlank()) {
            throw new IllegalArgumentException("statement must say where the simulation is accurate, was " + statement);
        }
    }
}
