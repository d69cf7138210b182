package org.foldbook.dsp.filter;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Stages in series: the magnitudes multiply, so the attenuations in dB add. Sums the dB values
 * (rather than multiplying magnitudes) so deep stopbands of several stages do not underflow to 0.
 */
public final class Cascade implements FrequencyResponse {

    private final List<FrequencyResponse> stages;

    private Cascade(List<FrequencyResponse> stages) {
        this.stages = List.copyOf(stages);
    }

    /** A cascade of the given stages in signal order; nested cascades are flattened. */
    public static Cascade of(FrequencyResponse... stages) {
        return of(Arrays.asList(stages));
    }

    /** A cascade of the given stages in signal order; nested cascades are flattened. */
    public static Cascade of(List<? extends FrequencyResponse> stages) {
        if (stages == null || stages.isEmpty()) {
            throw new IllegalArgumentException("stages must name at least one stage, was " + stages);
        }
        List<FrequencyResponse> flat = new ArrayList<>();
        for (int i = 0; i < stages.size(); i++) {
            FrequencyResponse s = stages.get(i);
            if (s == null) {
                throw new IllegalArgumentException("stages[" + i + "] must not be null");
            }
            if (s instanceof Cascade c) {
                flat.addAll(c.stages);
            } else {
                flat.add(s);
            }
        }
        return new Cascade(flat);
    }

    /** The stages in signal order (unmodifiable). */
    public List<FrequencyResponse> stages() {
        return stages;
    }

    @Override
    public double magnitude(double frequencyHz) {
        double m = 1;
        for (FrequencyResponse s : stages) {
            m *= s.magnitude(frequencyHz);
        }
        return m;
    }

    @Override
    public double attenuationDb(double frequencyHz) {
        double a = 0;
        for (FrequencyResponse s : stages) {
            a += s.attenuationDb(frequencyHz);
        }
        return a;
    }

    @Override
    public double[] landmarksHz(double upToHz) {
        double[] all = new double[0];
        for (FrequencyResponse s : stages) {
            double[] l = s.landmarksHz(upToHz);
            double[] merged = Arrays.copyOf(all, all.length + l.length);
            System.arraycopy(l, 0, merged, all.length, l.length);
            all = merged;
        }
        Arrays.sort(all);
        return all;
    }

    @Override
    public boolean attenuationNonDecreasing() {
        for (FrequencyResponse s : stages) {
            if (!s.attenuationNonDecreasing()) {
                return false;
            }
        }
        return true;
    }

    @Override
    public String toString() {
        return "Cascade" + stages;
    }
}
