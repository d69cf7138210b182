package org.foldbook.dsp.resample;

/**
 * A re-sampler that can compute any range of its outputs straight from the whole input held in memory,
 * with no streaming state: the sweep engine then writes outputs directly into its spectrum buffer, with
 * no copy of input or output.
 */
public interface RandomAccessResampler extends Resampler {

    /**
     * Outputs {@code first .. first+count-1} of {@code samples} into {@code out[outOffset ..]}.
     *
     * @param samples the whole input (for some re-samplers a prepared series, see {@link #offersRandomAccess})
     */
    void evaluate(double[] samples, long first, double[] out, int outOffset, int count);

    /** Whether {@link #evaluate} may be used in this configuration (true unless the class says otherwise). */
    default boolean offersRandomAccess() {
        return true;
    }
}
