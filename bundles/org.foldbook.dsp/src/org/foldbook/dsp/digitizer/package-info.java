/**
 * Digitizer figures: ideal quantisation noise and the attenuation aliases need
 * ({@link org.foldbook.dsp.digitizer.IdealQuantiser}), and a chain's alias-free band, protection
 * margin and lowest alias-free rate ({@link org.foldbook.dsp.digitizer.AliasAnalysis}); all at once
 * for one channel with {@link org.foldbook.dsp.digitizer.ProtectionFigures#of}.
 */
package org.foldbook.dsp.digitizer;
