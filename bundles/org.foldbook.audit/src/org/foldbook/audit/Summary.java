package org.foldbook.audit;

import java.util.Collection;

/**
 * How many findings of each severity, and the worst.
 *
 * @param errors   findings of severity ERROR
 * @param warnings of severity WARNING
 * @param infos    of severity INFO
 */
public record Summary(int errors, int warnings, int infos) {

    static Summary of(Collection<Finding> findings) {
        int e = 0, w = 0, i = 0;
        for (Finding f : findings) {
            switch (f.severity()) {
            case ERROR -> e++;
            case WARNING -> w++;
            case INFO -> i++;
            }
        }
        return new Summary(e, w, i);
    }

    Summary plus(Summary o) {
        return new Summary(errors + o.errors, warnings + o.warnings, infos + o.infos);
    }

    /** The worst severity present, INFO when there is nothing else. */
    public Severity worst() {
        return errors > 0 ? Severity.ERROR : warnings > 0 ? Severity.WARNING : Severity.INFO;
    }

    /** True when a finding at or above {@code threshold} exists. */
    public boolean reaches(Severity threshold) {
        return switch (threshold) {
        case ERROR -> errors > 0;
        case WARNING -> errors + warnings > 0;
        case INFO -> errors + warnings + infos > 0;
        };
    }

    @Override
    public String toString() {
        return errors + " error(s), " + warnings + " warning(s), " + infos + " note(s)";
    }
}
