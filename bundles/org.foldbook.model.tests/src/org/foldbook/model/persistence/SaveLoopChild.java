package org.foldbook.model.persistence;

import java.io.IOException;
import java.nio.file.Path;

import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Sensor;

/**
 * Child process of {@link CrashDuringSaveTest}: builds a large (CLEARLY SYNTHETIC) notebook and saves
 * it over and over, generation after generation, until it is killed. Prints "saving N" before and
 * "saved N" after each save. Arguments: target file, number of devices.
 */
public final class SaveLoopChild {

    private SaveLoopChild() {
    }

    static Notebook large(int devices, long generation) {
        Notebook notebook = NotebookFactory.eINSTANCE.createNotebook();
        notebook.setTitle(title(generation));
        for (int i = 0; i < devices; i++) {
            Sensor sensor = NotebookFactory.eINSTANCE.createSensor();
            sensor.setId("S-" + i);
            sensor.setModelName("synthetic sensor " + i);
            sensor.setSerialNumber("SN-" + (1_000_000 + i));
            sensor.setNotes("padding so that a save takes long enough to be interrupted: " + "x".repeat(200));
            sensor.setUsableMaxHz(1000.0 + i);
            notebook.getDevices().add(sensor);
        }
        return notebook;
    }

    static String title(long generation) {
        return "generation " + generation;
    }

    public static void main(String[] args) throws IOException {
        Path target = Path.of(args[0]);
        int devices = Integer.parseInt(args[1]);
        long generation = Long.parseLong(args[2]);
        Notebook notebook = large(devices, generation);
        while (true) {
            generation++;
            notebook.setTitle(title(generation));
            System.out.println("saving " + generation);
            System.out.flush();
            NotebookStore.save(notebook, target);
            System.out.println("saved " + generation);
            System.out.flush();
        }
    }
}
