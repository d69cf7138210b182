package org.foldbook.ui.simulation;

import java.io.IOException;
import java.time.Instant;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.foldbook.channel.ChannelData;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ChannelSimulation;
import org.foldbook.channel.ReadProgress;
import org.foldbook.channel.SimulationArchive;
import org.foldbook.channel.SimulationSetup;
import org.foldbook.channel.WhatIfRate;
import org.foldbook.model.Channel;
import org.foldbook.model.SimulationRun;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SourceSpectrum;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/**
 * Reads a channel's recording, runs its simulation through the channel services (the same calls as
 * {@code foldbook sweep --notebook}), keeps the result beside the notebook and prepares the what-if rate.
 * Progress: the read, then one tick a rate; cancel stops the read or the sweep between blocks. The outcome
 * goes to {@code done} on the job's thread; the part moves it to the UI thread.
 */
final class SimulationJob extends Job {
    /** What a finished run hands back; {@code run} is unattached (the part adds it by a command). */
    record Outcome(SweepResult result, SimulationRun run, WhatIfRate whatIf, String problem) {
    }

    private final Channel channel;
    private final SimulationPlanner.Request request;
    private final boolean sweep;
    private final Consumer<Outcome> done;

    boolean sweeps() {
        return sweep;
    }

    SimulationPlanner.Request request() {
        return request;
    }

    /** {@code sweep} false: only read the recording and prepare the what-if rate (for a kept run). */
    SimulationJob(Channel channel, SimulationPlanner.Request request, boolean sweep,
            java.util.function.BiConsumer<SimulationJob, Outcome> done) {
        super(sweep ? "Simulating " + channel.getName() : "Reading " + channel.getName() + " for the what-if rate");
        this.channel = channel;
        this.request = request;
        this.sweep = sweep;
        AtomicBoolean delivered = new AtomicBoolean();
        this.done = o -> {
            if (!delivered.getAndSet(true)) {
                done.accept(this, o);
            }
        };
        setUser(true);
        // cancelled before it started, run() never comes: the part must still hear of it
        addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                SimulationJob.this.done.accept(new Outcome(null, null, null, "Cancelled."));
            }
        });
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor sub = SubMonitor.convert(monitor, getName(), 1000);
        try {
            SubMonitor reading = sub.split(300);
            reading.setTaskName("Reading " + channel.getName());
            ChannelData data = ChannelReader.read(channel, ChannelReader.ReadRequest.STRICT, new ReadProgress() {
                @Override
                public void framesRead(long doneFrames, long total) {
                    reading.setWorkRemaining(1000).worked(0);
                }

                @Override
                public boolean cancelled() {
                    return monitor.isCanceled();
                }
            });
            SimulationSetup setup = request.setup(channel, data.rateHz());
            SourceSpectrum source = SourceSpectrum.of(data.samples(), data.rateHz(), setup.settings());
            WhatIfRate whatIf = new WhatIfRate(data.samples(), source, setup.resampling());
            if (!sweep) {
                done.accept(new Outcome(null, null, whatIf, null));
                return Status.OK_STATUS;
            }
            SubMonitor rates = sub.split(700).setWorkRemaining(setup.ladder().size());
            SweepResult result;
            try (SweepEngine engine = new SweepEngine(Math.max(1, Math.min(2, Runtime.getRuntime().availableProcessors())))) {
                result = ChannelSimulation.run(data, setup, engine, new SweepProgress() {
                    @Override
                    public synchronized void rateDone(RateResult r, int n, int total) {
                        rates.subTask(n + " of " + total + " rates done");
                        rates.worked(1);
                    }

                    @Override
                    public boolean isCancelled() {
                        return monitor.isCanceled();
                    }
                });
            }
            SimulationRun run = SimulationArchive.save(channel, setup, data, result, Instant.now());
            done.accept(new Outcome(result, run, whatIf, null));
            return Status.OK_STATUS;
        } catch (CancellationException | org.eclipse.core.runtime.OperationCanceledException e) {
            done.accept(new Outcome(null, null, null, "Cancelled."));
            return Status.CANCEL_STATUS;
        } catch (IOException | IllegalArgumentException | IllegalStateException e) {
            done.accept(new Outcome(null, null, null, e.getMessage()));
            return Status.OK_STATUS;   // shown in the part; not a framework error
        } finally {
            monitor.done();
        }
    }
}
