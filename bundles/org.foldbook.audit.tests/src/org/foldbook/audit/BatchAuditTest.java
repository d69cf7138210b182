package org.foldbook.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Random;

import org.foldbook.model.SignalChain;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Exit codes and the recursive search of the command line's audit, on synthetic notebooks. */
class BatchAuditTest {
    @TempDir
    Path dir;

    private void cleanNotebook(Path folder) throws Exception {
        SyntheticRig rig = new SyntheticRig(folder, 3_000);
        SignalChain good = rig.chain("GOOD", 8_000, 4, 1_000);
        Random r = new Random(7);
        rig.channel("a", good, 8_000, 16_384, LocalDate.of(2025, 3, 1),
                n -> 0.25 * Math.sin(2 * Math.PI * 500 * n / 8_000) + 5e-5 * r.nextGaussian());
        rig.saved();
    }

    @Test
    void exitCodesFollowTheThreshold() throws Exception {
        Path one = dir.resolve("deep/er/one");
        cleanNotebook(one);
        Path two = dir.resolve("two");
        cleanNotebook(two);
        Files.write(two.resolve("data/a.wav"), new byte[] {1, 2, 3}, java.nio.file.StandardOpenOption.APPEND);
        BatchAudit.Outcome o = BatchAudit.run(new BatchAudit.Request(dir, Auditor.Scope.ALL, dir.resolve("r.html"),
                dir.resolve("r.json"), Severity.ERROR), AuditProgress.NONE);
        // two notebooks found below the folder; the changed file in the second is an error → exit 1
        assertEquals(2, o.audits().size());
        assertEquals(BatchAudit.FINDINGS, o.exitCode(), o.error());
        assertTrue(Files.isRegularFile(dir.resolve("r-2.html")) && Files.isRegularFile(dir.resolve("r-2.json")));
        BatchAudit.Outcome first = BatchAudit.run(new BatchAudit.Request(one, Auditor.Scope.ALL, null, null,
                Severity.ERROR), AuditProgress.NONE);
        assertEquals(BatchAudit.CLEAN, first.exitCode(), first.audits().get(0).summary().toString());
    }

    @Test
    void badInputIsExitTwoNamingTheFile() throws Exception {
        BatchAudit.Outcome missing = BatchAudit.run(new BatchAudit.Request(dir.resolve("nope.foldbook"),
                Auditor.Scope.ALL, null, null, Severity.WARNING), AuditProgress.NONE);
        assertEquals(BatchAudit.INPUT_ERROR, missing.exitCode());
        assertTrue(missing.error().contains("nope.foldbook"), missing.error());
        Path bad = dir.resolve("bad.foldbook");
        Files.writeString(bad, "<not a notebook");
        BatchAudit.Outcome broken = BatchAudit.run(new BatchAudit.Request(bad, Auditor.Scope.ALL, null, null,
                Severity.WARNING), AuditProgress.NONE);
        assertEquals(BatchAudit.INPUT_ERROR, broken.exitCode());
        assertTrue(broken.error().contains("bad.foldbook"), broken.error());
        cleanNotebook(dir.resolve("ok"));
        BatchAudit.Outcome noChannel = BatchAudit.run(new BatchAudit.Request(dir.resolve("ok"),
                new Auditor.Scope(null, "no such channel"), null, null, Severity.WARNING), AuditProgress.NONE);
        assertEquals(BatchAudit.INPUT_ERROR, noChannel.exitCode());
        assertTrue(noChannel.error().contains("no such channel"), noChannel.error());
    }
}
