/**
 * Models of the acquisition chain's filters, all speaking
 * {@link org.foldbook.dsp.filter.FrequencyResponse} so a chain is a
 * {@link org.foldbook.dsp.filter.Cascade}: analog low-passes as zeros/poles/gain
 * ({@link org.foldbook.dsp.filter.AnalogLowPass}: RC, Butterworth, Bessel, Chebyshev I, elliptic), a
 * delta-sigma digitizer's decimation filter as a mask
 * ({@link org.foldbook.dsp.filter.DigitizerDigitalFilter}), a camera's exposure
 * ({@link org.foldbook.dsp.filter.ExposureBoxcar}); searches over frequency
 * ({@link org.foldbook.dsp.filter.AttenuationSearch}); and the digital realisation of an analog model
 * at a source rate ({@link org.foldbook.dsp.filter.DigitalRealisation} →
 * {@link org.foldbook.dsp.filter.SecondOrderSections} → streaming
 * {@link org.foldbook.dsp.filter.SosFilter}).
 */
package org.foldbook.dsp.filter;
