package org.gyreplan.app.desktop.ui;

import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.cell.PropertyValueFactory;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.gyreplan.app.desktop.map.Format;
import org.gyreplan.app.desktop.study.ScheduleRow;

import java.util.List;

/** The cruise schedule with totals and the at-sea cautions always visible above it. */
public class PlanPanel extends VBox {
    /** Cautions shown wherever plans are shown. */
    public static final String CAUTION = "Not for navigation — verify against official charts and notices to mariners; "
            + "permits and local regulations apply; the master and licensed practice decide.";

    /** Table row with text cells. */
    public static final class Row {
        private final String step, what, distance, hours, arrival;
        Row(ScheduleRow r) {
            step = String.valueOf(r.step());
            what = r.what();
            distance = r.distanceKm() > 0 ? Format.number(r.distanceKm()) : "";
            hours = Format.number(r.hours());
            arrival = r.arrival();
        }
        public String getStep() { return step; }
        public String getWhat() { return what; }
        public String getDistance() { return distance; }
        public String getHours() { return hours; }
        public String getArrival() { return arrival; }
    }

    private final TableView<Row> table = new TableView<>();
    private final Label totals = new Label();

    public PlanPanel() {
        setSpacing(6);
        setPadding(new Insets(8));
        Label caution = new Label("⚠ " + CAUTION);
        caution.setId("caution");
        caution.setWrapText(true);
        caution.getStyleClass().add("caution");
        table.setId("scheduleTable");
        table.getColumns().add(col("#", "step", 34));
        table.getColumns().add(col("Activity", "what", 130));
        table.getColumns().add(col("km", "distance", 60));
        table.getColumns().add(col("h", "hours", 55));
        table.getColumns().add(col("Ends (UTC)", "arrival", 120));
        table.setPlaceholder(new Label("No cruise plan in this study"));
        VBox.setVgrow(table, Priority.ALWAYS);
        totals.setId("scheduleTotals");
        getChildren().addAll(caution, totals, table);
    }

    private static TableColumn<Row, String> col(String name, String prop, double w) {
        TableColumn<Row, String> c = new TableColumn<>(name);
        c.setCellValueFactory(new PropertyValueFactory<>(prop));
        c.setPrefWidth(w);
        c.setSortable(false);
        return c;
    }

    public TableView<Row> table() { return table; }
    public String totalsText() { return totals.getText(); }

    public void show(List<ScheduleRow> rows) {
        table.getItems().setAll(rows.stream().map(Row::new).toList());
        double km = rows.stream().mapToDouble(ScheduleRow::distanceKm).sum();
        double h = rows.stream().mapToDouble(ScheduleRow::hours).sum();
        totals.setText(rows.isEmpty() ? "" : "Total " + Format.number(km) + " km, " + Format.number(h) + " h ("
                + Format.number(h / 24) + " days)");
    }
}
