package org.foldbook.ui.recording;

import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Consumer;
import java.util.function.LongConsumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.foldbook.channel.ChannelDataException;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ReadProgress;
import org.foldbook.model.Channel;
import org.foldbook.ui.preferences.SpectrumSettingsValues;

/**
 * Reads a channel's recording in the background ({@link RecordingAnalysis}), reporting progress in
 * per-mille of the frames and stopping between blocks when cancelled. Exactly one callback runs at the
 * end, on the job's thread: the overview, a problem (naming the file), or the cancellation.
 */
public final class ReadRecordingJob extends Job {
    private final Channel channel;
    private final SpectrumSettingsValues settings;
    private final Consumer<RecordingOverview> done;
    private final Consumer<String> failed;
    private final Runnable cancelled;
    private final LongConsumer perMille;
    private final AtomicBoolean ran = new AtomicBoolean();

    public ReadRecordingJob(Channel channel, SpectrumSettingsValues settings, LongConsumer perMille, Consumer<RecordingOverview> done,
            Consumer<String> failed, Runnable cancelled) {
        super("Reading the recording of channel '" + channel.getName() + "'");
        this.channel = channel;
        this.settings = settings;
        this.perMille = perMille;
        this.done = done;
        this.failed = failed;
        this.cancelled = cancelled;
        setUser(true);
        // a job cancelled before it ran never enters run(): report that cancellation here
        addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                if (event.getResult().getSeverity() == IStatus.CANCEL && !ran.get()) {
                    cancelled.run();
                }
            }
        });
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        ran.set(true);
        SubMonitor sub = SubMonitor.convert(monitor, getName(), 1000);
        long[] reported = {0};
        ReadProgress progress = new ReadProgress() {
            @Override
            public void framesRead(long frames, long total) {
                long now = total > 0 ? frames * 1000 / total : 0;
                if (now > reported[0]) {
                    sub.worked((int) (now - reported[0]));
                    reported[0] = now;
                    perMille.accept(now);
                }
            }

            @Override
            public boolean cancelled() {
                return sub.isCanceled();
            }
        };
        try {
            done.accept(RecordingAnalysis.run(channel, ChannelReader.ReadRequest.STRICT, settings, progress));
            return Status.OK_STATUS;
        } catch (CancellationException e) {
            cancelled.run();
            return Status.CANCEL_STATUS;
        } catch (ChannelDataException e) {
            failed.accept(e.getMessage());
            return Status.OK_STATUS; // shown in the part; not an error of the workbench
        } catch (RuntimeException e) {
            failed.accept("reading channel '" + channel.getName() + "' failed: " + e);
            return Status.OK_STATUS;
        }
    }
}
