package org.foldbook.audit;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

/**
 * The audit of one notebook (or the part of it asked for).
 *
 * @param notebookTitle the notebook's title
 * @param file          the notebook file, when it was loaded from one
 * @param madeAt        when the audit ran
 * @param policy        the thresholds used
 * @param experiments   per experiment, its channels' audits
 */
public record NotebookAudit(String notebookTitle, Path file, Instant madeAt, AuditPolicy policy,
        List<ExperimentAudit> experiments) {

    public NotebookAudit {
        experiments = List.copyOf(experiments);
    }

    public Summary summary() {
        return experiments.stream().map(ExperimentAudit::summary).reduce(new Summary(0, 0, 0), Summary::plus);
    }

    /** Every channel audit, experiment by experiment. */
    public List<ChannelAudit> channels() {
        return experiments.stream().flatMap(e -> e.channels().stream()).toList();
    }

    /**
     * One experiment's channel audits.
     *
     * @param name     the experiment's name
     * @param channels its channels' audits
     */
    public record ExperimentAudit(String name, List<ChannelAudit> channels) {
        public ExperimentAudit {
            channels = List.copyOf(channels);
        }

        public Summary summary() {
            return channels.stream().map(ChannelAudit::summary).reduce(new Summary(0, 0, 0), Summary::plus);
        }
    }
}
