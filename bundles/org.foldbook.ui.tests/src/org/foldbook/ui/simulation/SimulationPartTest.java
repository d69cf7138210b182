package org.foldbook.ui.simulation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Scale;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Chart;
import org.foldbook.channel.ChannelData;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ChannelSimulation;
import org.foldbook.channel.ReadProgress;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.model.derived.Quantities;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.ui.notebook.NotebookDocument;
import org.foldbook.ui.testing.Widgets;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The simulation part in a real SWT shell on the demo's survey channel (204.8 kS/s, stored plan down to
 * 25.6 kS/s through the everyday chain), driven by clicks and typed values as a user would. The verdicts
 * shown are compared with the JSON of the service {@code foldbook sweep --notebook … --channel …} runs
 * (read with Jackson); where the 22.1 kHz bearing tone lands at 25.6 kS/s is checked against the fold
 * formula |f − k·fs| (Oppenheim &amp; Schafer ch. 4): 25.6 − 22.1 = 3.5 kHz.
 */
class SimulationPartTest {
    private static final long WAIT_NANOS = 90_000_000_000L;

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private SimulationPart part;
    private NotebookDocument document;
    private Channel survey;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1400, 900);
        shell.setLayout(new org.eclipse.swt.layout.FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        survey = document.notebook().getExperiments().get(2).getChannels().get(0);
        part = new SimulationPart();
        part.createControls(new Composite(shell, SWT.NONE));
        shell.open();
        part.show(document, survey);
        shell.layout(true, true);
    }

    @AfterEach
    void close() {
        part.dispose();
        shell.dispose();
        document.dispose();
    }

    @Test
    void runShowsMapVerdictsAndSafeRatesEqualToTheCommandLineJson() throws IOException {
        assertTrue(label("status").getText().startsWith("No kept run"), label("status").getText());
        runSweep();
        Table table = (Table) control("verdicts");
        JsonNode cli = cliJson(SimulationMode.MODELLED);
        JsonNode rates = cli.path("rates");
        int sources = cli.path("source").path("peaks").size();
        assertEquals(sources * rates.size(), table.getItemCount());
        int row = 0;
        for (int s = 0; s < sources; s++) {
            for (JsonNode r : rates) {
                JsonNode fate = r.path("sources").get(s);
                assertEquals(fate.path("sourcePeak").asInt(), s);
                String[] cells = new String[VerdictRows.COLUMNS.length];
                for (int c = 0; c < cells.length; c++) {
                    cells[c] = table.getItem(row).getText(c);
                }
                String where = "row " + row + " " + String.join(" | ", cells);
                assertEquals(Quantities.rate(r.path("rate").asDouble()), cells[1], where);
                assertEquals(fate.path("verdict").asText(), cells[2], where);
                JsonNode landsAt = fate.path("observedFrequency").isNumber() ? fate.path("observedFrequency")
                        : fate.path("apparentFrequency");
                assertEquals(Quantities.hz(landsAt.asDouble()), cells[3], where);
                JsonNode gain = fate.path("gainDb").isNumber() ? fate.path("gainDb") : fate.path("predictedGainDb");
                assertEquals(gain.isNumber() ? Quantities.signedDb(gain.asDouble()) : "", cells[4], where);
                assertEquals(fate.path("reason").asText(), cells[5], where);
                assertFalse(cells[5].isBlank(), where);
                row++;
            }
        }
        // the bearing tone at 22.1 kHz folds to 3.5 kHz at the everyday rate (fold formula)
        int last = rates.size() - 1;
        boolean bearing = false;
        for (int s = 0; s < sources; s++) {
            double f = cli.path("source").path("peaks").get(s).path("frequency").asDouble();
            if (Math.abs(f - 22_100) < 5) {
                String[] cells = {table.getItem(s * rates.size() + last).getText(2), table.getItem(s * rates.size() + last).getText(3)};
                assertEquals("folds", cells[0]);
                assertEquals(Quantities.hz(3_500), cells[1]);
                bearing = true;
            }
        }
        assertTrue(bearing, "the survey shows the 22.1 kHz bearing tone");
        // lowest safe rates: one line per source peak and the band of interest (0–5 kHz in the demo's plan)
        String summary = ((Text) control("summary")).getText();
        assertTrue(summary.contains("Band 0 Hz – 5 kHz"), summary);
        JsonNode band = cli.path("summary").path("band").path("lowestAliasFreeRate");
        assertTrue(band.isNull() ? summary.contains("no rate of the ladder") : summary.contains(Quantities.rate(band.asDouble())), summary);
        for (JsonNode p : cli.path("summary").path("peaks")) {
            assertTrue(summary.contains(Quantities.hz(p.path("frequency").asDouble()) + ": "), summary);
        }
        // kept beside the notebook and referred to from the experiment
        Experiment run3 = (Experiment) survey.eContainer();
        assertEquals(1, run3.getSimulations().size());
        assertTrue(Files.isRegularFile(folder.resolve(run3.getSimulations().get(0).getPath())));
    }

    @Test
    void mapAndTableSelectEachOther() {
        runSweep();
        LevelMapView map = part.mapView();
        Table table = (Table) control("verdicts");
        int pick = table.getItemCount() - 2;   // a source peak at the second-lowest rate
        table.setSelection(pick);
        table.notifyListeners(SWT.Selection, new Event());
        int[] ringed = map.selection();
        assertNotNull(ringed);
        VerdictRows.Row row = VerdictRows.of(part.result()).get(pick);
        assertArrayEquals(new int[] {row.sourcePeak(), row.rateIndex()}, ringed);

        // click the map where another peak lands at the highest rate: its row is selected
        VerdictRows.Row other = VerdictRows.of(part.result()).get(0);
        int[] p = map.pointOf(other.landsAtHz(), other.rateIndex());
        click(map.control(), p[0], p[1]);
        assertEquals(0, table.getSelectionIndex());
        assertArrayEquals(new int[] {other.sourcePeak(), other.rateIndex()}, map.selection());
    }

    @Test
    void cancelStopsTheRun() {
        push("run");
        push("cancel");
        waitUntil("the cancelled run", () -> ((Button) control("run")).isEnabled());
        assertEquals("Cancelled.", label("status").getText());
        assertEquals(0, ((Table) control("verdicts")).getItemCount());
        assertTrue(((Experiment) survey.eContainer()).getSimulations().isEmpty());
    }

    @Test
    void whatIfRateMovesTheSpectrumPreviewThenExact() {
        runSweep();
        waitUntil("the what-if rate", () -> ((Scale) control("whatIfScale")).isEnabled());
        Scale scale = (Scale) control("whatIfScale");
        Chart chart = (Chart) control("whatIfPlot");
        scale.setSelection(scale.getMaximum());   // the recording's own rate
        scale.notifyListeners(SWT.Selection, new Event());
        assertTrue(label("whatIfState").getText().startsWith("preview at 204.8 kS/s"), label("whatIfState").getText());
        double[] x = chart.getSeriesSet().getSeries()[0].getXSeries();
        assertEquals(102_400, x[x.length - 1], 1e-6);   // Nyquist of 204.8 kS/s
        waitUntil("the exact spectrum", () -> label("whatIfState").getText().startsWith("exact at 204.8 kS/s"));

        Text rate = (Text) control("whatIfRate");
        rate.setText("25600");
        rate.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(label("whatIfState").getText().startsWith("preview at 25.6 kS/s"), label("whatIfState").getText());
        double[] y = chart.getSeriesSet().getSeries()[0].getXSeries();
        assertEquals(12_800, y[y.length - 1], 1e-6);
        // one marker per source peak; the 22.1 kHz tone marked at 3.5 kHz (fold formula)
        assertEquals(1 + part.result().sources().size(), chart.getSeriesSet().getSeries().length);
        assertTrue(label("whatIfLandings").getText().contains(Quantities.hz(22_100) + " → folds " + Quantities.hz(3_500)),
                label("whatIfLandings").getText());
        waitUntil("the exact spectrum", () -> label("whatIfState").getText().startsWith("exact at 25.6 kS/s"));
        assertNotEquals(0, chart.getSeriesSet().getSeries()[0].getYSeries().length);
    }

    @Test
    void planEditsAreUndoableCommands() {
        assertEquals(16, survey.getSweepPlan().getRateCount());
        Text count = (Text) control("count");
        count.setText("8");
        count.notifyListeners(SWT.DefaultSelection, new Event());
        assertEquals(8, survey.getSweepPlan().getRateCount());
        count.setText("many");
        count.notifyListeners(SWT.DefaultSelection, new Event());
        assertEquals("Number of rates is not a whole number: 'many'.", label("status").getText());
        assertEquals(8, survey.getSweepPlan().getRateCount());
        document.undo();
        assertEquals(16, survey.getSweepPlan().getRateCount());
        assertEquals("16", count.getText());
    }

    @Test
    void reopeningShowsTheKeptRunAndMarksItStale() throws IOException {
        runSweep();
        int shown = ((Table) control("verdicts")).getItemCount();
        document.save();
        NotebookDocument again = NotebookDocument.load(document.file());
        try {
            Channel c = again.notebook().getExperiments().get(2).getChannels().get(0);
            part.show(again, c);
            assertTrue(label("status").getText().startsWith("Kept run of"), label("status").getText());
            assertFalse(label("status").getText().contains("STALE"), label("status").getText());
            assertEquals(shown, ((Table) control("verdicts")).getItemCount());
            // the modelled mode now goes through the channel's own chain instead of the everyday one
            org.eclipse.swt.widgets.Combo through = (org.eclipse.swt.widgets.Combo) control("through");
            through.select(0);
            through.notifyListeners(SWT.Selection, new Event());
            assertEquals(null, c.getSweepPlan().getThroughChain());
            part.show(again, null);
            part.show(again, c);
            assertTrue(label("status").getText().contains("STALE: the chain changed"), label("status").getText());
        } finally {
            part.show(null, null);
            again.dispose();
        }
    }

    private JsonNode cliJson(SimulationMode mode) throws IOException {
        ChannelData data = ChannelReader.read(survey, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        try (SweepEngine engine = new SweepEngine(2)) {
            String json = ChannelSimulation.run(data, ChannelSimulation.setup(survey, mode, data.rateHz()), engine,
                    SweepProgress.NONE).toJson();
            return new ObjectMapper().readTree(json);
        }
    }

    private void runSweep() {
        push("run");
        waitUntil("the sweep", () -> label("status").getText().startsWith("Done")
                || label("status").getText().startsWith("/") || label("status").getText().equals("Cancelled."));
        assertTrue(label("status").getText().startsWith("Done"), label("status").getText());
    }

    private void push(String id) {
        Button b = (Button) control(id);
        assertTrue(b.isEnabled(), id + " is enabled");
        Widgets.select(b);
    }

    private static void click(Control c, int x, int y) {
        Event e = new Event();
        e.x = x;
        e.y = y;
        e.button = 1;
        c.notifyListeners(SWT.MouseDown, e);
    }

    private Label label(String id) {
        return (Label) control(id);
    }

    private Control control(String id) {
        return Widgets.tagged(shell, SimulationPart.ID, id);
    }

    private void waitUntil(String what, BooleanSupplier condition) {
        Widgets.waitFor(display, condition, what, WAIT_NANOS, () -> "status: " + label("status").getText());
    }
}
