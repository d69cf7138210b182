package org.foldbook.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.foldbook.demo.GearboxDemo;
import org.foldbook.model.Experiment;
import org.foldbook.model.Recording;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code foldbook demo DIR}: writes the demo notebook and its recordings into DIR, without a display.
 * Never overwrites: when any of the files it would write is already there, it writes nothing and says
 * which.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = {"Writes the demo notebook (gearbox-stand.foldbook, SYNTHETIC data) and its recordings under "
                + "DIR/data, without a display. Refuses to overwrite any existing file; prints the notebook's path."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:written", "2:usage error, a file already there (nothing written), or a write failed"})
final class DemoCommand implements Callable<Integer> {
    @Parameters(paramLabel = "DIR", description = "folder to write into (created when missing)")
    Path dir;
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        Path folder = dir.toAbsolutePath().normalize();
        List<Path> there = new ArrayList<>();
        Path notebook = folder.resolve(GearboxDemo.NOTEBOOK_FILE);
        if (Files.exists(notebook)) {
            there.add(notebook);
        }
        for (Experiment e : GearboxDemo.build().getExperiments()) {
            for (Recording r : e.getRecordings()) {
                Path data = folder.resolve(r.getPath());
                if (Files.exists(data)) {
                    there.add(data);
                }
            }
        }
        if (!there.isEmpty()) {
            spec.commandLine().getErr().println("foldbook demo: not overwriting what is already there: " + there);
            return Main.BAD_INPUT;
        }
        spec.commandLine().getOut().println(GearboxDemo.write(folder));
        return Main.OK;
    }
}
