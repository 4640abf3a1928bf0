package org.gyreplan.app.desktop.ui;

import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.cell.PropertyValueFactory;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.gyreplan.app.desktop.map.Format;
import org.gyreplan.app.desktop.map.MapLayer;

import java.util.ArrayList;
import java.util.List;

/**
 * Values at the cursor (or at the last clicked point): position, depth and every field the study holds there,
 * each with its unit, for the current time step.
 */
public class InspectorPanel extends VBox {
    /** One table row. */
    public static final class Row {
        private final String quantity, value;
        public Row(String quantity, String value) { this.quantity = quantity; this.value = value; }
        public String getQuantity() { return quantity; }
        public String getValue() { return value; }
    }

    private final Label position = new Label("Move the cursor over the map");
    private final Label mode = new Label();
    private final TableView<Row> table = new TableView<>();

    public InspectorPanel() {
        setSpacing(6);
        setPadding(new Insets(8));
        position.setId("inspectPosition");
        mode.getStyleClass().add("hint");
        table.setId("inspectTable");
        TableColumn<Row, String> q = new TableColumn<>("Quantity");
        q.setCellValueFactory(new PropertyValueFactory<>("quantity"));
        q.setPrefWidth(190);
        TableColumn<Row, String> v = new TableColumn<>("Value");
        v.setCellValueFactory(new PropertyValueFactory<>("value"));
        v.setPrefWidth(120);
        table.getColumns().add(q);
        table.getColumns().add(v);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.setPlaceholder(new Label("No data at this point"));
        VBox.setVgrow(table, Priority.ALWAYS);
        getChildren().addAll(position, mode, table);
    }

    public TableView<Row> table() { return table; }

    /** Shows the values of all layers at (lon, lat). */
    public void show(double lonDeg, double latDeg, List<MapLayer> layers, int timeStep, String stepLabel, boolean pinned) {
        position.setText(Format.lat(latDeg) + "   " + Format.lon(lonDeg));
        mode.setText((pinned ? "Clicked point" : "Under the cursor") + (stepLabel == null ? "" : " — step " + stepLabel));
        List<Row> rows = new ArrayList<>();
        for (MapLayer l : layers) {
            for (MapLayer.Probe p : l.probe(lonDeg, latDeg, timeStep)) rows.add(new Row(p.quantity(), p.text()));
        }
        table.getItems().setAll(rows);
    }

    /** The text of a quantity's value, or null if absent (for tests). */
    public String valueOf(String quantity) {
        for (Row r : table.getItems()) if (r.getQuantity().equals(quantity)) return r.getValue();
        return null;
    }
}
