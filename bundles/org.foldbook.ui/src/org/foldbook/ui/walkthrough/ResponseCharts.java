package org.foldbook.ui.walkthrough;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.model.SignalChain;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Quantities;

/**
 * Magnitude charts of a stage's response in this chain: gain in dB from 0 Hz to past the front end's upper
 * frequency, the Nyquist line, the needed attenuation, and the fold-back bands shaded — the front end's
 * content above Nyquist, and the part of the baseband it lands on ({@link ChainFigures#foldedBandHz}).
 */
final class ResponseCharts {

    static final int POINTS = 600;

    private ResponseCharts() {
    }

    /** The chart of {@code response} in {@code chain} (needs a rate or a front-end upper frequency). */
    static Optional<StageChart> of(String title, SignalChain chain, FrequencyResponse response) {
        double rate = ChainFigures.samplingRateHz(chain);
        double upper = ChainFigures.frontEndUpperHz(chain);
        double top = Math.max(rate > 0 ? 1.5 * rate : 0, upper > 0 ? 1.15 * upper : 0);
        if (!(top > 0)) {
            return Optional.empty();
        }
        double need = ChainFigures.need(chain).map(ChainFigures.Need::requiredDb).orElse(Double.NaN);
        double floor = -20 * Math.ceil((Double.isNaN(need) ? 100 : need + 30) / 20);
        double[] x = new double[POINTS + 1];
        double[] y = new double[POINTS + 1];
        for (int i = 0; i <= POINTS; i++) {
            x[i] = top * i / POINTS;
            y[i] = Math.max(floor, -response.attenuationDb(x[i]));
        }
        double peak = 0;
        for (double v : y) {
            peak = Math.max(peak, v);
        }
        double ceiling = 10 * Math.ceil((peak + 5) / 10); // room for a resonance's peak
        List<StageChart.Line> lines = new ArrayList<>();
        List<StageChart.Band> bands = new ArrayList<>();
        lines.add(new StageChart.Line("response", x, y, StageChart.Style.LINE));
        if (rate > 0) {
            double nyquist = rate / 2;
            lines.add(new StageChart.Line("Nyquist " + Quantities.hz(nyquist), new double[] { nyquist, nyquist },
                    new double[] { floor, ceiling }, StageChart.Style.MARKER));
            if (upper > nyquist) {
                bands.add(new StageChart.Band("folds back: " + Quantities.hz(nyquist) + " – " + Quantities.hz(upper),
                        nyquist, Math.min(upper, top), true));
                ChainFigures.foldedBandHz(upper, rate).ifPresent(b -> bands.add(new StageChart.Band(
                        "lands in " + Quantities.hz(b.lowHz()) + " – " + Quantities.hz(b.highHz()), b.lowHz(),
                        b.highHz(), false)));
            }
        }
        if (!Double.isNaN(need)) {
            lines.add(new StageChart.Line("need −" + Quantities.number(need) + " dB", new double[] { 0, top },
                    new double[] { -need, -need }, StageChart.Style.MARKER));
        }
        return Optional.of(new StageChart(title, "Frequency (Hz)", "Gain (dB)", lines, bands,
                new double[] { 0, top }, new double[] { floor, ceiling }));
    }
}
