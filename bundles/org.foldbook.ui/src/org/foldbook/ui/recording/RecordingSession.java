package org.foldbook.ui.recording;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;

import org.foldbook.model.Channel;
import org.foldbook.ui.preferences.SpectrumPreferences;
import org.foldbook.ui.preferences.SpectrumSettingsValues;

/**
 * The one read and analysis of the selected channel's recording ({@link RecordingAnalysis} in a
 * {@link ReadRecordingJob}), shared by every part that shows it (the Recording view, the Fold explorer): a
 * part asks for a channel, and a read already running or finished for that channel with the current
 * preferences is reused instead of reading the file again. A change of the spectrum preferences analyses
 * the channel again for all of them. Free of SWT: listeners hear on the job's thread (or the caller's) and
 * move to the UI thread themselves.
 */
public final class RecordingSession {
    /** Where the analysis of {@link State#channel} stands. */
    public enum Phase {
        READING, DONE, FAILED, CANCELLED
    }

    /**
     * The session's state: {@code overview} once DONE, {@code problem} once FAILED or CANCELLED, progress in
     * per-mille while READING.
     */
    public record State(Channel channel, SpectrumSettingsValues settings, Phase phase, long perMille,
            RecordingOverview overview, String problem) {
    }

    private final SpectrumPreferences preferences;
    private final List<Consumer<State>> listeners = new CopyOnWriteArrayList<>();
    private final AtomicInteger reads = new AtomicInteger();
    private final Consumer<SpectrumSettingsValues> onPreferences = v -> settingsChanged();
    private State state;
    private ReadRecordingJob job;

    /** A session reading with {@code preferences} (null: the defaults, fixed). */
    public RecordingSession(SpectrumPreferences preferences) {
        this.preferences = preferences;
        if (preferences != null) {
            preferences.addListener(onPreferences);
        }
    }

    private SpectrumSettingsValues settings() {
        return preferences == null ? SpectrumSettingsValues.DEFAULT : preferences.values();
    }

    /** The latest state, or null before the first request. */
    public synchronized State state() {
        return state;
    }

    /** How many reads of a recording this session started (each one a pass over a file). */
    public int reads() {
        return reads.get();
    }

    /**
     * Makes {@code channel} the session's channel: reuses a read of it with the current settings that is
     * running or done, else reads it. Returns the state then (listeners hear of a new read as it starts).
     */
    public State request(Channel channel) {
        synchronized (this) {
            if (state != null && state.channel() == channel && state.settings().equals(settings())
                    && (state.phase() == Phase.READING || state.phase() == Phase.DONE)) {
                return state;
            }
        }
        return start(channel);
    }

    /** Reads {@code channel} again whatever was read before ("Read again"). */
    public State reread(Channel channel) {
        return start(channel);
    }

    /** Asks the running read to stop; its listeners hear CANCELLED. */
    public void cancel() {
        ReadRecordingJob running;
        synchronized (this) {
            running = job;
        }
        if (running != null) {
            running.cancel();
        }
    }

    private void settingsChanged() {
        Channel c;
        synchronized (this) {
            c = state == null ? null : state.channel();
        }
        if (c != null) {
            start(c);
        }
    }

    private State start(Channel channel) {
        SpectrumSettingsValues settings = settings();
        ReadRecordingJob previous;
        ReadRecordingJob[] self = new ReadRecordingJob[1];
        State begun = new State(channel, settings, Phase.READING, 0, null, null);
        self[0] = new ReadRecordingJob(channel, settings,
                perMille -> update(self[0], new State(channel, settings, Phase.READING, perMille, null, null)),
                overview -> update(self[0], new State(channel, settings, Phase.DONE, 1000, overview, null)),
                problem -> update(self[0], new State(channel, settings, Phase.FAILED, 0, null, problem)),
                () -> update(self[0], new State(channel, settings, Phase.CANCELLED, 0, null,
                        "Reading channel '" + channel.getName() + "' was cancelled; press Read again to read it.")));
        synchronized (this) {
            previous = job;
            job = self[0];
            state = begun;
        }
        if (previous != null) {
            previous.cancel();   // its outcome is ignored: it is no longer the session's job
        }
        reads.incrementAndGet();
        fire(begun);
        self[0].schedule();
        return begun;
    }

    private void update(ReadRecordingJob from, State next) {
        synchronized (this) {
            if (from != job) {
                return;
            }
            state = next;
            if (next.phase() != Phase.READING) {
                job = null;
            }
        }
        fire(next);
    }

    private void fire(State s) {
        for (Consumer<State> l : listeners) {
            l.accept(s);
        }
    }

    public void addListener(Consumer<State> listener) {
        listeners.add(listener);
    }

    public void removeListener(Consumer<State> listener) {
        listeners.remove(listener);
    }

    /** Stops the running read and leaves the preferences alone. */
    public void dispose() {
        cancel();
        if (preferences != null) {
            preferences.removeListener(onPreferences);
        }
    }
}
