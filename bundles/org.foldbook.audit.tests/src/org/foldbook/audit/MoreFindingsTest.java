package org.foldbook.audit;

import static org.foldbook.audit.SyntheticRig.find;
import static org.foldbook.audit.SyntheticRig.of;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Date;
import java.util.Random;

import org.foldbook.model.Notebook;
import org.foldbook.model.SignalChain;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Energy near Nyquist, flat runs, a file that disagrees with the notebook, a rig out of its validity. */
class MoreFindingsTest {
    static final LocalDate DAY = LocalDate.of(2025, 3, 1);

    @TempDir
    Path dir;

    private static ChannelAudit audit(Notebook nb, String name) {
        return new Auditor(AuditPolicy.DEFAULT).audit(find(nb, name), AuditProgress.NONE);
    }

    @Test
    void whiteNoiseIsHighAtNyquistAndTheTwoPointAverageIsNot() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        SignalChain c = rig.chain("C", 8_000, 0, 0);
        double[] w = new Random(11).doubles(65_537).map(v -> 0.1 * (v - 0.5)).toArray();
        rig.channel("white", c, 8_000, 65_536, DAY, n -> w[n + 1]);
        rig.channel("averaged", c, 8_000, 65_536, DAY, n -> (w[n + 1] + w[n]) / 2);
        Notebook nb = rig.saved();
        Finding white = of(audit(nb, "white"), AuditKind.ENERGY_AT_NYQUIST).get(0);
        assertEquals(Severity.WARNING, white.severity());
        assertEquals(0.0, white.value("dropDb"), 1.0); // white: as high at fs/2 as anywhere
        // no filter recorded: the flat model folds white noise at the sensor up to 4·fs onto itself, flat too
        assertEquals(0.0, white.value("modelDropDb"), 0.1);
        assertTrue(white.message().contains("the chain does not protect the top of the band"), white.message());
        Finding avg = of(audit(nb, "averaged"), AuditKind.ENERGY_AT_NYQUIST).get(0);
        // y = (x[n] + x[n−1])/2 has |H(f)|² = cos²(πf/fs) (closed form); the floor over 0–fs/4 is its median,
        // cos²(π/8), and the top 5 % its mean over 0.475–0.5 fs (midpoint rule below)
        double mean = 0;
        for (int i = 0; i < 10_000; i++) {
            double f = 0.475 + 0.025 * (i + 0.5) / 10_000;
            mean += Math.pow(Math.cos(Math.PI * f), 2) / 10_000;
        }
        double expected = 10 * Math.log10(Math.pow(Math.cos(Math.PI / 8), 2) / mean);
        assertEquals(Severity.INFO, avg.severity());
        assertEquals(expected, avg.value("dropDb"), 1.5);
    }

    @Test
    void whiteDataBehindARecordedFilterDoubtTheFilter() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        SignalChain c = rig.chain("F", 8_000, 8, 2_000); // 8-pole Butterworth at fs/4
        double[] w = new Random(13).doubles(65_536).map(v -> 0.1 * (v - 0.5)).toArray();
        rig.channel("filtered", c, 8_000, 65_536, DAY, n -> w[n]);
        Finding f = of(audit(rig.saved(), "filtered"), AuditKind.ENERGY_AT_NYQUIST).get(0);
        assertEquals(Severity.WARNING, f.severity());
        // the model: |H|² = 1/(1 + (f/fc)^16) is below −40 dB over 3.8–4 kHz (closed form) while 0–2 kHz is
        // within 3 dB of flat, so the predicted drop is far above the 10 dB the policy asks
        assertTrue(f.value("modelDropDb") > 35, "model drop " + f.value("modelDropDb"));
        assertTrue(f.message().contains("did not act as recorded"), f.message());
    }

    @Test
    void aFlatRunAFileAtAnotherRateAndARigOutOfItsValidityAreFound() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        rig.rig.setValidUntil(Date.from(LocalDate.of(2024, 12, 31).atStartOfDay(ZoneOffset.UTC).toInstant()));
        SignalChain good = rig.chain("GOOD", 8_000, 4, 1_000);
        Random r = new Random(12);
        // by construction: 200 samples held at 0.3 from 4000 (a stuck converter)
        rig.channel("held", good, 8_000, 16_384, DAY, n -> n >= 4000 && n < 4200 ? 0.3
                : 0.25 * Math.sin(2 * Math.PI * 500 * n / 8_000) + 5e-5 * r.nextGaussian());
        Notebook nb = rig.saved();
        find(nb, "held").getRecording().setDeclaredRateHz(10_000); // the notebook now disagrees with the file
        ChannelAudit a = audit(nb, "held");
        Finding flat = of(a, AuditKind.FLAT_RUN).get(0);
        assertEquals(200, flat.value("longestRun"));
        assertEquals(4000, flat.value("longestRunStart"));
        Finding rate = of(a, AuditKind.FILE_DISAGREES).get(0);
        assertEquals(8_000, rate.value("fileRateHz"));
        assertEquals(10_000, rate.value("notebookRateHz"));
        Finding rigDate = of(a, AuditKind.RIG_NOT_VALID).get(0);
        assertTrue(rigDate.message().contains("2025-03-01") && rigDate.message().contains("2024-12-31"), rigDate.message());
    }
}
