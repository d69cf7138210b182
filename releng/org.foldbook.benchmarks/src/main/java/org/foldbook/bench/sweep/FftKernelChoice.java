package org.foldbook.bench.sweep;

import org.foldbook.dsp.fft.RealFft;

/**
 * Selects the FFT kernel of a benchmark fork. The choice is made once per JVM, when the FFT classes are
 * first used (dsp.fft.FftKernels reads {@code foldbook.fft.vector}); JMH runs every parameter combination
 * in its own fork, so a setup that calls this before touching anything of dsp gets the kernel asked for,
 * and fails loudly when it did not.
 */
public final class FftKernelChoice {
    private FftKernelChoice() {
    }

    /** {@code kernel}: "vector-api" or "jtransforms". */
    public static void select(String kernel) {
        System.setProperty("foldbook.fft.vector", String.valueOf("vector-api".equals(kernel)));
        String got = RealFft.of(4096).kernel();
        if (!got.equals(kernel)) {
            throw new IllegalStateException("FFT kernel " + kernel + " asked for, " + got + " in use (the choice is"
                    + " made once per JVM; vector-api needs --add-modules jdk.incubator.vector)");
        }
    }
}
