package org.foldbook.ui.notebook;

import java.util.Arrays;
import java.util.Optional;

import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.model.SignalChain;
import org.foldbook.model.derived.ChainFigures;

/**
 * What the chain-response chart shows, computed without SWT: |H(f)| in dB from 0 to past the front
 * end's upper frequency, the part of it above Nyquist that folds (filtered or not), the Nyquist line
 * and the needed attenuation. Empty when the chain has no rate.
 *
 * @param x          frequencies, Hz
 * @param gainDb     −attenuation at {@code x}, floored at {@link #FLOOR_DB}
 * @param foldsFrom  first index of the folding part (above Nyquist, up to the front end), -1 if none
 * @param foldsTo    last index of the folding part
 * @param filtered   whether a filter protects the chain (names the folding series)
 * @param nyquistHz  half the rate
 * @param needDb     the needed attenuation, NaN when the chain states none
 * @param topHz      right end of the frequency axis
 */
record ChainResponseSeries(double[] x, double[] gainDb, int foldsFrom, int foldsTo, boolean filtered,
        double nyquistHz, double needDb, double topHz) {

    static final int POINTS = 800;
    static final double FLOOR_DB = -160;

    static Optional<ChainResponseSeries> of(SignalChain chain) {
        double rate = ChainFigures.samplingRateHz(chain);
        if (!(rate > 0)) {
            return Optional.empty();
        }
        FrequencyResponse response = ChainFigures.chainResponse(chain);
        double upper = ChainFigures.frontEndUpperHz(chain);
        double top = Math.max(1.5 * rate, Double.isNaN(upper) ? 0 : 1.15 * upper);
        double[] x = new double[POINTS + 1];
        double[] y = new double[POINTS + 1];
        for (int i = 0; i <= POINTS; i++) {
            x[i] = top * i / POINTS;
            y[i] = Math.max(FLOOR_DB, -response.attenuationDb(x[i]));
        }
        double nyquist = rate / 2;
        int from = -1;
        int to = -1;
        if (upper > nyquist) {
            from = (int) Math.ceil(nyquist / top * POINTS);
            to = (int) Math.floor(Math.min(upper, top) / top * POINTS);
            if (to <= from) {
                from = -1;
                to = -1;
            }
        }
        boolean filtered = ChainFigures.filterStage(chain) != null || ChainFigures.hasBuiltInDigitalFilter(chain);
        double need = ChainFigures.figures(chain).map(ProtectionFigures::requiredAttenuationDb).orElse(Double.NaN);
        return Optional.of(new ChainResponseSeries(x, y, from, to, filtered, nyquist, need, top));
    }

    double[] foldsX() {
        return foldsFrom < 0 ? new double[0] : Arrays.copyOfRange(x, foldsFrom, foldsTo + 1);
    }

    double[] foldsGainDb() {
        return foldsFrom < 0 ? new double[0] : Arrays.copyOfRange(gainDb, foldsFrom, foldsTo + 1);
    }
}
