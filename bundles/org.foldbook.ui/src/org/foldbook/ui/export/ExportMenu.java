package org.foldbook.ui.export;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Supplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.MessageBox;
import org.eclipse.swt.widgets.Table;
import org.foldbook.ui.chart.PlotView;

/**
 * The export context menu of every chart (PNG, SVG, CSV, JSON) and table (CSV, JSON). Other parts attach
 * it to their tables with {@link #attach(Table, String)}; {@link PlotView} attaches it to itself. The
 * writing itself is in {@link #writeChart} / {@link #writeTable}, which tests call with a path.
 */
public final class ExportMenu {
    /** File kinds, by extension. */
    public enum Kind {
        PNG, SVG, CSV, JSON;

        String extension() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    private ExportMenu() {
    }

    public static void attach(PlotView plot) {
        Control control = plot.control();
        Menu menu = new Menu(control);
        for (Kind kind : Kind.values()) {
            item(menu, "Export chart as " + kind + "…", kind, () -> safeName(plot.title()),
                    file -> writeChart(plot, kind, file));
        }
        control.setMenu(menu);
        plot.control().getPlotArea().getControl().setMenu(menu);
    }

    public static void attach(Table table, String title) {
        Menu menu = new Menu(table);
        for (Kind kind : new Kind[] {Kind.CSV, Kind.JSON}) {
            item(menu, "Export table as " + kind + "…", kind, () -> safeName(title),
                    file -> writeTable(TableData.of(title, table), kind, file));
        }
        table.setMenu(menu);
    }

    /** Writes what {@code plot} shows now into {@code file} (UI thread: PNG copies the chart's pixels). */
    public static void writeChart(PlotView plot, Kind kind, Path file) throws IOException {
        switch (kind) {
            case PNG -> plot.control().save(file.toString(), SWT.IMAGE_PNG);
            case SVG -> ChartSvg.write(plot.data(), file);
            case CSV -> DataFiles.chartCsv(plot.data(), file);
            case JSON -> DataFiles.chartJson(plot.data(), file);
            default -> throw new IllegalArgumentException(String.valueOf(kind));
        }
    }

    public static void writeTable(TableData table, Kind kind, Path file) throws IOException {
        switch (kind) {
            case CSV -> DataFiles.tableCsv(table, file);
            case JSON -> DataFiles.tableJson(table, file);
            default -> throw new IllegalArgumentException("a table exports as CSV or JSON, not " + kind);
        }
    }

    private interface Writer {
        void write(Path file) throws IOException;
    }

    private static void item(Menu menu, String text, Kind kind, Supplier<String> name, Writer writer) {
        MenuItem item = new MenuItem(menu, SWT.PUSH);
        item.setText(text);
        item.addListener(SWT.Selection, e -> {
            FileDialog dialog = new FileDialog(menu.getShell(), SWT.SAVE);
            dialog.setOverwrite(true);
            dialog.setFilterExtensions(new String[] {"*." + kind.extension()});
            dialog.setFileName(name.get() + "." + kind.extension());
            String chosen = dialog.open();
            if (chosen == null) {
                return;
            }
            try {
                writer.write(Path.of(chosen));
            } catch (IOException | RuntimeException ex) {
                MessageBox box = new MessageBox(menu.getShell(), SWT.ICON_ERROR | SWT.OK);
                box.setText("Export failed");
                box.setMessage(chosen + ": " + ex.getMessage());
                box.open();
            }
        });
    }

    private static String safeName(String title) {
        String s = title.replaceAll("[^A-Za-z0-9._-]+", "-").replaceAll("^-+|-+$", "");
        return s.isEmpty() ? "chart" : s.toLowerCase(Locale.ROOT);
    }
}
