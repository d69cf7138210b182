package org.foldbook.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** JSON (RFC 8259) and CSV forms of a sweep result. */
class SweepResultFormatTest {

    static SweepResult sample() {
        double[] x = Tones.of(1 << 15, 19, new double[] {1.5, 4.0}, new double[] {1, 0.5}, 1e-4, 9);
        try (SweepEngine e = new SweepEngine(1)) {
            return e.run(x, RateLadder.ofRates(19, new double[] {19, 9.5, 1.9}, 100), Resampling.bare(),
                    SpectrumSettings.DEFAULT, SweepProgress.NONE).withBand(0, 0.5);
        }
    }

    @Test
    @DisplayName("JSON: per rate index, up, down, effective rate, peaks with frequency, level, verdict, source peak")
    void jsonShape() {
        SweepResult r = sample();
        Map<String, Object> root = TestJson.obj(TestJson.parse(r.toJson()));
        assertEquals("foldbook-sweep", root.get("format"));
        assertEquals(1.0, root.get("version"));
        assertEquals("bare", root.get("mode"));
        Map<String, Object> src = TestJson.obj(root.get("source"));
        assertEquals(19.0, src.get("rate"));
        assertEquals(2, TestJson.arr(src.get("peaks")).size());
        List<Object> rates = TestJson.arr(root.get("rates"));
        assertEquals(3, rates.size());
        Set<String> verdicts = Set.of("survives", "folds", "unexplained");
        for (int i = 0; i < rates.size(); i++) {
            Map<String, Object> rate = TestJson.obj(rates.get(i));
            assertEquals((double) i, rate.get("index"));
            RateStep st = r.rates().get(i).step();
            assertEquals((double) st.up(), rate.get("up"));
            assertEquals((double) st.down(), rate.get("down"));
            assertEquals(st.effectiveRate(), (Double) rate.get("rate"), 0.0, "exact round trip of the rate");
            for (Object o : TestJson.arr(rate.get("peaks"))) {
                Map<String, Object> p = TestJson.obj(o);
                assertTrue(p.get("frequency") instanceof Double);
                assertTrue(p.get("levelDb") instanceof Double);
                assertTrue(verdicts.contains(p.get("verdict")), String.valueOf(p.get("verdict")));
                if (p.get("verdict").equals("unexplained")) {
                    assertNull(p.get("sourcePeak"));
                } else {
                    assertTrue(p.get("sourcePeak") instanceof Double);
                }
            }
            assertEquals(2, TestJson.arr(rate.get("sources")).size());
        }
        // 1.5 Hz at 1.9 S/s: folds to 0.4 Hz (common practice)
        Map<String, Object> last = TestJson.obj(TestJson.arr(TestJson.obj(rates.get(2)).get("sources")).get(0));
        assertEquals("folds", last.get("verdict"));
        assertEquals(0.4, (Double) last.get("apparentFrequency"), 0.01);
        Map<String, Object> summary = TestJson.obj(root.get("summary"));
        assertEquals(2, TestJson.arr(summary.get("peaks")).size());
        Map<String, Object> band = TestJson.obj(summary.get("band"));
        assertEquals(0.5, band.get("high"));
        // band 0..0.5 Hz: at 9.5 S/s the 4 Hz tone stays put; at 1.9 S/s 1.5 Hz folds to 0.4 Hz, into the band
        assertEquals(9.5, (Double) band.get("lowestAliasFreeRate"), 1e-12);
    }

    @Test
    @DisplayName("JSON writer: escapes, NaN as null, shortest round-trip doubles (RFC 8259)")
    void writerBasics() {
        String s = new JsonWriter().beginObject().member("a\"b\\\n", "x\u0001y").member("nan", Double.NaN)
                .member("third", 1.0 / 3).member("n", 42L).name("list").beginArray().value(true).value((String) null)
                .endArray().endObject().toString();
        assertEquals("{\"a\\\"b\\\\\\n\":\"x\\u0001y\",\"nan\":null,\"third\":0.3333333333333333,\"n\":42,"
                + "\"list\":[true,null]}", s);
        Map<String, Object> m = TestJson.obj(TestJson.parse(s));
        assertEquals(1.0 / 3, m.get("third"));
        assertThrows(IllegalArgumentException.class, () -> TestJson.parse("{\"a\":1,}"));
    }

    @Test
    @DisplayName("CSV: header and one row per seen peak plus one per suppressed or merged source peak")
    void csvRows() {
        SweepResult r = sample();
        String[] lines = r.toCsv().split("\n");
        assertEquals("index,up,down,rate_hz,frequency_hz,level_db,verdict,source_peak,gain_db", lines[0]);
        long expected = 0;
        for (RateResult rr : r.rates()) {
            expected += rr.observed().size();
            expected += rr.fates().stream()
                    .filter(f -> f.verdict() != Verdict.SURVIVES && f.verdict() != Verdict.FOLDS).count();
        }
        assertEquals(expected, lines.length - 1);
        for (int i = 1; i < lines.length; i++) {
            assertEquals(9, lines[i].split(",", -1).length, lines[i]);
        }
    }

    @Test
    @DisplayName("JSON: the band the mode is accurate in, and the modelled chain's warnings naming the uncertain bands")
    void accuracyAndWarnings() {
        double fs0 = 96_000;
        double[] x = Tones.of(1 << 15, fs0, new double[] {31_000, 44_000}, new double[] {1, 1}, 1e-6, 4);
        try (SweepEngine e = new SweepEngine(1)) {
            // a 4-pole Butterworth at 40 kHz passes about -17 dB at fs0/2: content above it was never recorded
            SweepResult r = e.run(x, RateLadder.ofRates(fs0, new double[] {24_000}, 100),
                    Resampling.modelledFilter(org.foldbook.dsp.filter.AnalogLowPass.butterworth(4, 40_000)),
                    SpectrumSettings.DEFAULT, SweepProgress.NONE);
            Map<String, Object> root = TestJson.obj(TestJson.parse(r.toJson()));
            Map<String, Object> acc = TestJson.obj(root.get("accuracy"));
            assertEquals(0.49 * fs0, (Double) acc.get("upToHz"), 1e-9);
            assertTrue(((String) acc.get("statement")).contains("0.1 dB"));
            List<Object> w = TestJson.arr(root.get("warnings"));
            assertEquals(2, w.size(), w.toString());
            Map<String, Object> unrecorded = TestJson.obj(w.get(1));
            assertEquals(fs0 / 2, (Double) unrecorded.get("fromHz"), 1e-9);
            assertNull(unrecorded.get("uncertaintyDb"), "content may be missing altogether: no finite bound");
            assertTrue(((String) unrecorded.get("text")).contains("missing"));
            SweepResult bare = e.run(x, RateLadder.ofRates(fs0, new double[] {24_000}, 100), Resampling.bare(),
                    SpectrumSettings.DEFAULT, SweepProgress.NONE);
            // bare: exact to 0.49·fs0; the kernel alone only to 0.39·fs0 (BareSampler's measured accuracy)
            assertEquals(0.49 * fs0, bare.accuracy().upToHz(), 1e-9);
            assertTrue(bare.accuracy().statement().contains("no images"));
            assertEquals(0.39 * fs0, Resampling.bareKernel().accuracy(fs0).upToHz(), 1e-9);
            // a digitizer without filter folds what it gets above fs0/2, which no recording at fs0 holds: said so
            assertTrue(bare.warnings().stream().anyMatch(sw -> Double.isInfinite(sw.toHz())), bare.warnings().toString());
        }
    }
}
