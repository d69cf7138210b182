package org.foldbook.audit;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;

import org.foldbook.dsp.fold.Folding;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * The report's plots, drawn by JFreeChart into JFreeSVG: the channel's spectrum with the suspect peaks
 * marked, the chain's attenuation before sampling, and the fold map (true frequency → where it appears).
 */
final class AuditCharts {
    static final int WIDTH = 860;
    static final int HEIGHT = 300;
    private static final Color LINE = new Color(0x1f4e79);
    private static final Color SUSPECT = new Color(0xc0392b);
    private static final Color MAYBE = new Color(0xd68910);
    private static final Color FINE = new Color(0x1e8449);
    private static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    private AuditCharts() {
    }

    static String spectrum(ChannelSpectrum sp, java.util.List<PeakAssessment> peaks) {
        XYSeries line = new XYSeries("spectrum", false, true);
        for (int k = 1; k < sp.bins(); k++) {
            line.add(k * sp.binHz(), sp.levelDb(k));
        }
        XYSeries fine = new XYSeries("trustworthy peak", false, true);
        XYSeries maybe = new XYSeries("could be folded", false, true);
        XYSeries bad = new XYSeries("probably folded", false, true);
        for (PeakAssessment p : peaks) {
            int k = (int) Math.round(p.frequencyHz() / sp.binHz());
            double y = sp.levelDb(Math.min(Math.max(k, 0), sp.bins() - 1));
            (p.verdict() == PeakVerdict.TRUSTWORTHY ? fine : p.verdict() == PeakVerdict.COULD_BE_FOLDED ? maybe : bad)
                    .add(p.frequencyHz(), y);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(line);
        data.addSeries(fine);
        data.addSeries(maybe);
        data.addSeries(bad);
        String unit = Double.isNaN(sp.fullScale()) ? "dB re unit²/Hz" : "dB re FS²/Hz";
        XYPlot plot = plot(data, "frequency (Hz)", "density (" + unit + ")");
        XYLineAndShapeRenderer r = renderer(new Color[] {LINE, FINE, MAYBE, SUSPECT}, new boolean[] {true, false, false, false});
        plot.setRenderer(r);
        for (PeakAssessment p : peaks) {
            if (p.verdict() != PeakVerdict.TRUSTWORTHY) {
                int k = (int) Math.round(p.frequencyHz() / sp.binHz());
                XYTextAnnotation a = new XYTextAnnotation(" " + p.verdict().words(), p.frequencyHz(),
                        sp.levelDb(Math.min(Math.max(k, 0), sp.bins() - 1)) + 3);
                a.setFont(SMALL);
                a.setPaint(p.verdict() == PeakVerdict.PROBABLY_FOLDED ? SUSPECT : MAYBE);
                a.setTextAnchor(TextAnchor.BOTTOM_LEFT);
                plot.addAnnotation(a);
            }
        }
        return svg(new JFreeChart("Spectrum of the recording (Welch, Hann), suspect peaks marked", SMALL, plot, true));
    }

    static String chain(ChannelAudit c, double requiredDb) {
        double top = c.frontEndUpperHz() > 0 ? Math.max(c.frontEndUpperHz(), c.rateHz()) : 2 * c.rateHz();
        XYSeries att = new XYSeries("attenuation before sampling", false, true);
        for (int i = 0; i <= 800; i++) {
            double f = top * i / 800.0;
            double a = c.protection().attenuationDb(f);
            att.add(f, Double.isFinite(a) ? Math.min(a, 200) : 200);
        }
        XYSeriesCollection data = new XYSeriesCollection(att);
        XYPlot plot = plot(data, "frequency at the sensor (Hz)", "attenuation (dB)");
        plot.setRenderer(renderer(new Color[] {LINE}, new boolean[] {true}));
        marker(plot, c.rateHz() / 2, "Nyquist");
        if (Double.isFinite(requiredDb)) {
            ValueMarker m = new ValueMarker(requiredDb, SUSPECT, new BasicStroke(1f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_MITER, 1f, new float[] {4f, 4f}, 0f));
            m.setLabel("needed " + Words.db(requiredDb));
            m.setLabelFont(SMALL);
            m.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            plot.addRangeMarker(m);
            NumberAxis y = (NumberAxis) plot.getRangeAxis();
            y.setRange(Math.min(0, y.getLowerBound()), Math.max(y.getUpperBound(), requiredDb * 1.1));
        }
        foldBands(plot, c);
        return svg(new JFreeChart("The chain's attenuation ahead of the digitizer", SMALL, plot, true));
    }

    static String foldMap(ChannelAudit c) {
        double rate = c.rateHz();
        double top = c.frontEndUpperHz() > 0 ? c.frontEndUpperHz() : 2 * rate;
        XYSeries saw = new XYSeries("where a true frequency appears", true, true);
        int steps = (int) Math.min(4000, Math.max(200, 8 * top / rate * 50));
        for (int i = 0; i <= steps; i++) {
            double f = top * i / steps;
            saw.add(f, Folding.apparentHz(f, rate));
        }
        // the sawtooth's corners, so the line is exact at k·fs/2
        for (double z = rate / 2; z <= top; z += rate / 2) {
            saw.add(z, Folding.apparentHz(z, rate));
        }
        XYSeries fine = new XYSeries("candidate of a trustworthy peak", false, true);
        XYSeries maybe = new XYSeries("candidate of a peak that could be folded", false, true);
        XYSeries bad = new XYSeries("candidate of a probably folded peak", false, true);
        for (PeakAssessment p : c.peaks()) {
            XYSeries s = p.verdict() == PeakVerdict.TRUSTWORTHY ? fine
                    : p.verdict() == PeakVerdict.COULD_BE_FOLDED ? maybe : bad;
            for (PeakCandidate k : p.candidates()) {
                s.add(k.trueHz(), p.frequencyHz());
            }
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(saw);
        data.addSeries(fine);
        data.addSeries(maybe);
        data.addSeries(bad);
        XYPlot plot = plot(data, "true frequency at the sensor (Hz)", "appears at (Hz)");
        plot.setRenderer(renderer(new Color[] {LINE, FINE, MAYBE, SUSPECT}, new boolean[] {true, false, false, false}));
        marker(plot, rate / 2, "Nyquist");
        foldBands(plot, c);
        return svg(new JFreeChart("Fold map at " + org.foldbook.model.derived.Quantities.rate(rate)
                + " (shaded: passed into the fold)", SMALL, plot, true));
    }

    private static void foldBands(XYPlot plot, ChannelAudit c) {
        for (ChannelAudit.FoldBandView b : c.foldBands()) {
            IntervalMarker m = new IntervalMarker(b.fromHz(), b.toHz(), new Color(192, 57, 43, 40));
            plot.addDomainMarker(m, org.jfree.chart.ui.Layer.BACKGROUND);
        }
    }

    private static void marker(XYPlot plot, double x, String label) {
        ValueMarker m = new ValueMarker(x, Color.DARK_GRAY, new BasicStroke(1f));
        m.setLabel(label);
        m.setLabelFont(SMALL);
        m.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        plot.addDomainMarker(m);
    }

    private static XYPlot plot(XYSeriesCollection data, String x, String y) {
        NumberAxis xa = new NumberAxis(x);
        NumberAxis ya = new NumberAxis(y);
        ya.setAutoRangeIncludesZero(false);
        xa.setLabelFont(SMALL);
        ya.setLabelFont(SMALL);
        XYPlot plot = new XYPlot(data, xa, ya, null);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdddddd));
        plot.setRangeGridlinePaint(new Color(0xdddddd));
        return plot;
    }

    private static XYLineAndShapeRenderer renderer(Color[] colours, boolean[] lines) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        for (int i = 0; i < colours.length; i++) {
            r.setSeriesPaint(i, colours[i]);
            r.setSeriesLinesVisible(i, lines[i]);
            r.setSeriesShapesVisible(i, !lines[i]);
            r.setSeriesStroke(i, new BasicStroke(1.2f));
        }
        return r;
    }

    private static String svg(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.getTitle().setFont(new Font(Font.SANS_SERIF, Font.BOLD, 13));
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        chart.draw(g, new Rectangle(0, 0, WIDTH, HEIGHT));
        return g.getSVGElement();
    }
}
