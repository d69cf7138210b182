package org.foldbook.ui.export;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

/**
 * A table's header and rows as text, the source of its CSV and JSON exports.
 *
 * @param title what the table is (the JSON's "title")
 */
public record TableData(String title, List<String> columns, List<List<String>> rows) {
    public TableData {
        columns = List.copyOf(columns);
        List<List<String>> copy = new ArrayList<>();
        for (List<String> row : rows) {
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException("table '" + title + "': a row of " + row.size()
                        + " cells under " + columns.size() + " columns");
            }
            copy.add(List.copyOf(row));
        }
        rows = List.copyOf(copy);
    }

    /** What an SWT table shows now (UI thread). */
    public static TableData of(String title, Table table) {
        List<String> columns = new ArrayList<>();
        for (TableColumn c : table.getColumns()) {
            columns.add(c.getText());
        }
        List<List<String>> rows = new ArrayList<>();
        for (TableItem item : table.getItems()) {
            List<String> row = new ArrayList<>();
            for (int i = 0; i < columns.size(); i++) {
                row.add(item.getText(i));
            }
            rows.add(row);
        }
        return new TableData(title, columns, rows);
    }
}
