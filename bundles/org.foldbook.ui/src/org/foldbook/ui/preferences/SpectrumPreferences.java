package org.foldbook.ui.preferences;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.osgi.service.prefs.BackingStoreException;

/**
 * The spectrum and peak preferences of the workbench, persisted in the Eclipse preferences of our bundle
 * (instance scope: the workspace's {@code .metadata/.plugins/org.eclipse.core.runtime/.settings}), shared
 * through the application context. Parts read {@link #values()} when they analyse and listen for changes.
 * Free of SWT; listeners hear on the thread that called {@link #set} (the dialog's: the UI thread).
 */
public final class SpectrumPreferences {
    /** The preference node: our bundle's. */
    public static final String NODE = "org.foldbook.ui";
    static final String KIND = "peaks.kind";
    static final String MARGIN = "peaks.marginDb";
    static final String FLOOR = "peaks.floorBins";
    static final String SEGMENT = "recording.maxSegment";
    static final String NOISE_AWARE = "noise-aware";
    static final String PROMINENCE = "prominence";

    private final IEclipsePreferences node;
    private final List<Consumer<SpectrumSettingsValues>> listeners = new ArrayList<>();
    private volatile SpectrumSettingsValues values;
    private String loadProblem;

    /** The preferences kept in {@code node}; unusable stored values give the defaults and a problem in words. */
    public SpectrumPreferences(IEclipsePreferences node) {
        this.node = node;
        SpectrumSettingsValues d = SpectrumSettingsValues.DEFAULT;
        try {
            String kind = node.get(KIND, NOISE_AWARE);
            if (!kind.equals(NOISE_AWARE) && !kind.equals(PROMINENCE)) {
                throw new IllegalArgumentException("The peak rule must be '" + NOISE_AWARE + "' or '" + PROMINENCE
                        + "', was '" + kind + "'.");
            }
            values = SpectrumSettingsValues.parse(kind.equals(NOISE_AWARE),
                    node.get(MARGIN, Double.toString(d.marginDb())),
                    node.get(FLOOR, Integer.toString(d.floorBins())),
                    node.get(SEGMENT, Integer.toString(d.recordingMaxSegment())));
        } catch (IllegalArgumentException e) {
            values = d;
            loadProblem = "The stored preferences (" + node.absolutePath() + ") are unusable: " + e.getMessage()
                    + " The defaults are in use.";
        }
    }

    /** The workbench's preferences: instance scope of our bundle. */
    public static SpectrumPreferences workbench() {
        return new SpectrumPreferences(InstanceScope.INSTANCE.getNode(NODE));
    }

    public SpectrumSettingsValues values() {
        return values;
    }

    /** Why the stored values were not used (null when they were). */
    public String loadProblem() {
        return loadProblem;
    }

    /**
     * Makes {@code next} the preferences, writes them to the store and tells the listeners when they changed.
     *
     * @return null, or why the store could not be written (the values are in use for this session anyway)
     */
    public String set(SpectrumSettingsValues next) {
        String problem = null;
        node.put(KIND, next.noiseAware() ? NOISE_AWARE : PROMINENCE);
        node.put(MARGIN, Double.toString(next.marginDb()));
        node.putInt(FLOOR, next.floorBins());
        node.putInt(SEGMENT, next.recordingMaxSegment());
        try {
            node.flush();
        } catch (BackingStoreException e) {
            problem = "The preferences could not be saved (" + e.getMessage() + "); they apply until the workbench"
                    + " closes.";
        }
        loadProblem = null;
        SpectrumSettingsValues before = values;
        values = next;
        if (!next.equals(before)) {
            for (Consumer<SpectrumSettingsValues> l : List.copyOf(listeners)) {
                l.accept(next);
            }
        }
        return problem;
    }

    public void addListener(Consumer<SpectrumSettingsValues> listener) {
        listeners.add(listener);
    }

    public void removeListener(Consumer<SpectrumSettingsValues> listener) {
        listeners.remove(listener);
    }
}
