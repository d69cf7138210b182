package org.foldbook.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.foldbook.model.Experiment;
import org.foldbook.model.Recording;
import org.foldbook.demo.GearboxDemo;

/**
 * {@code foldbook demo DIR}: writes the demo notebook and its recordings into DIR, without a display.
 * Never overwrites: when any of the files it would write is already there, it writes nothing and says
 * which.
 */
final class DemoCommand {
    static final String USAGE = """
            usage: foldbook demo DIR
              writes the demo notebook (gearbox-stand.foldbook, SYNTHETIC data) and its recordings under DIR/data;
              refuses to overwrite any existing file
            """;

    private DemoCommand() {
    }

    static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 1 && (args[0].equals("-h") || args[0].equals("--help"))) {
            err.print(USAGE);
            return Main.OK;
        }
        if (args.length != 1 || args[0].startsWith("-")) {
            err.print(USAGE);
            return Main.BAD_INPUT;
        }
        Path dir = Path.of(args[0]).toAbsolutePath().normalize();
        List<Path> there = new ArrayList<>();
        Path notebook = dir.resolve(GearboxDemo.NOTEBOOK_FILE);
        if (Files.exists(notebook)) {
            there.add(notebook);
        }
        for (Experiment e : GearboxDemo.build().getExperiments()) {
            for (Recording r : e.getRecordings()) {
                Path data = dir.resolve(r.getPath());
                if (Files.exists(data)) {
                    there.add(data);
                }
            }
        }
        if (!there.isEmpty()) {
            err.println("foldbook demo: not overwriting what is already there: " + there);
            return Main.BAD_INPUT;
        }
        try {
            Path written = GearboxDemo.write(dir);
            out.println(written);
            return Main.OK;
        } catch (IOException e) {
            err.println("foldbook demo: " + e.getMessage());
            return Main.IO_ERROR;
        }
    }
}
