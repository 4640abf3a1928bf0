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
        private final String step, leg, distance, transit, station, arrival;
        Row(ScheduleRow r) {
            step = String.valueOf(r.step());
            leg = r.leg();
            distance = Format.tick(r.distanceNmi());
            transit = Format.tick(r.transitHours());
            station = r.stationHours() > 0 ? Format.tick(r.stationHours()) : "";
            arrival = r.arrivalUtc();
        }
        public String getStep() { return step; }
        public String getLeg() { return leg; }
        public String getDistance() { return distance; }
        public String getTransit() { return transit; }
        public String getStation() { return station; }
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
        table.getColumns().add(col("#", "step", 30));
        table.getColumns().add(col("Leg", "leg", 130));
        table.getColumns().add(col("nmi", "distance", 48));
        table.getColumns().add(col("Sail h", "transit", 48));
        table.getColumns().add(col("Work h", "station", 52));
        table.getColumns().add(col("Arrives (UTC)", "arrival", 115));
        table.setPlaceholder(new Label("No cruise plan in this study"));
        VBox.setVgrow(table, Priority.ALWAYS);
        totals.setId("scheduleTotals");
        totals.setWrapText(true);
        totals.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
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

    /** Shows the rows and a one-line summary (e.g. totals and departure). */
    public void show(List<ScheduleRow> rows, String summary) {
        table.getItems().setAll(rows.stream().map(Row::new).toList());
        totals.setText(summary == null ? "" : summary);
    }
}
