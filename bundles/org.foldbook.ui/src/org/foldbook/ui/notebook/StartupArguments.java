package org.foldbook.ui.notebook;

import java.nio.file.Path;

/** Reads the notebook to open from the application's command-line arguments. */
final class StartupArguments {

    private StartupArguments() {
    }

    /**
     * The first argument naming a {@code .foldbook} file (arguments starting with '-' are options and
     * skipped), as an absolute path; null when there is none.
     */
    static Path notebookPath(String[] args) {
        if (args == null) {
            return null;
        }
        for (String arg : args) {
            if (arg.startsWith("-")) {
                continue;
            }
            if (arg.toLowerCase(java.util.Locale.ROOT).endsWith(".foldbook")) {
                return Path.of(arg).toAbsolutePath().normalize();
            }
        }
        return null;
    }
}
