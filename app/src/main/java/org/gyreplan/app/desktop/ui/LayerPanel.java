package org.gyreplan.app.desktop.ui;

import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.gyreplan.app.desktop.map.ColourScale;
import org.gyreplan.app.desktop.map.Format;
import org.gyreplan.app.desktop.map.MapCanvas;
import org.gyreplan.app.desktop.map.MapLayer;
import org.gyreplan.app.desktop.map.ScalarFieldLayer;

import java.util.Collections;
import java.util.Locale;

/**
 * The layer list: topmost layer first, a check box per layer to show or hide it, buttons to move the selected
 * layer up or down in the drawing order, and the colour range of the selected layer (min, max, automatic).
 */
public class LayerPanel extends VBox {
    private final MapCanvas map;
    private final ListView<MapLayer> list = new ListView<>();
    private final TextField minField = new TextField(), maxField = new TextField();
    private final Label rangeNote = new Label();
    private final GridPane rangeBox = new GridPane();

    public LayerPanel(MapCanvas map) {
        this.map = map;
        setSpacing(6);
        setPadding(new Insets(8));
        setPrefWidth(250);
        setMinWidth(180);
        Label title = new Label("Layers");
        title.getStyleClass().add("panel-title");
        list.setId("layerList");
        list.setCellFactory(v -> new LayerCell());
        VBox.setVgrow(list, Priority.ALWAYS);
        Button up = new Button("▲ Up"), down = new Button("▼ Down");
        up.setId("layerUp");
        down.setId("layerDown");
        up.setTooltip(new Tooltip("Draw the selected layer above the next one"));
        down.setTooltip(new Tooltip("Draw the selected layer below the next one"));
        up.setOnAction(e -> move(+1));
        down.setOnAction(e -> move(-1));
        HBox buttons = new HBox(6, up, down);

        minField.setId("rangeMin");
        maxField.setId("rangeMax");
        minField.setPrefColumnCount(7);
        maxField.setPrefColumnCount(7);
        Button apply = new Button("Apply");
        apply.setId("rangeApply");
        Button auto = new Button("Auto");
        auto.setId("rangeAuto");
        apply.setOnAction(e -> applyRange());
        minField.setOnAction(e -> applyRange());
        maxField.setOnAction(e -> applyRange());
        auto.setOnAction(e -> {
            MapLayer l = list.getSelectionModel().getSelectedItem();
            if (l instanceof ScalarFieldLayer sl) sl.autoRange();
            showRange();
            map.redraw();
        });
        rangeBox.setHgap(6);
        rangeBox.setVgap(4);
        rangeBox.addRow(0, new Label("Colour min"), minField);
        rangeBox.addRow(1, new Label("Colour max"), maxField);
        rangeBox.add(new HBox(6, apply, auto), 1, 2);
        rangeBox.add(rangeNote, 0, 3, 2, 1);
        rangeNote.setWrapText(true);
        rangeNote.getStyleClass().add("hint");
        rangeBox.setDisable(true);
        Label rangeTitle = new Label("Colour range of selected layer");
        rangeTitle.getStyleClass().add("panel-subtitle");
        getChildren().addAll(title, list, buttons, rangeTitle, rangeBox);

        list.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> showRange());
        refresh();
        map.layers().addListener((javafx.collections.ListChangeListener<MapLayer>) c -> refresh());
    }

    public ListView<MapLayer> list() { return list; }

    /** Rebuilds the list from the map, topmost first. */
    public void refresh() {
        MapLayer sel = list.getSelectionModel().getSelectedItem();
        java.util.List<MapLayer> rev = new java.util.ArrayList<>(map.layers());
        Collections.reverse(rev);
        list.getItems().setAll(rev);
        if (sel != null) list.getSelectionModel().select(sel);
    }

    /** Moves the selected layer one place up (+1, drawn later) or down (−1) in the drawing order. */
    public void move(int delta) {
        MapLayer l = list.getSelectionModel().getSelectedItem();
        if (l == null) return;
        int k = map.layers().indexOf(l), to = k + delta;
        if (to < 0 || to >= map.layers().size()) return;
        Collections.swap(map.layers(), k, to);
        list.getSelectionModel().select(l);
        map.redraw();
    }

    private void showRange() {
        MapLayer l = list.getSelectionModel().getSelectedItem();
        ColourScale s = l == null ? null : l.colourScale();
        rangeBox.setDisable(s == null);
        if (s == null) {
            minField.clear();
            maxField.clear();
            rangeNote.setText("");
            return;
        }
        minField.setText(Format.number(s.min()));
        maxField.setText(Format.number(s.max()));
        rangeNote.setText(s.kind() == ColourScale.Kind.DIVERGING
                ? "Signed field: the scale stays centred on zero (−a … +a)." : "");
    }

    private void applyRange() {
        MapLayer l = list.getSelectionModel().getSelectedItem();
        if (l == null || l.colourScale() == null) return;
        try {
            double lo = Double.parseDouble(minField.getText().trim().replace('−', '-'));
            double hi = Double.parseDouble(maxField.getText().trim().replace('−', '-'));
            l.colourScale().setRange(lo, hi);
            rangeNote.setText(l.colourScale().kind() == ColourScale.Kind.DIVERGING
                    ? "Signed field: the scale stays centred on zero (−a … +a)." : "");
        } catch (NumberFormatException ex) {
            rangeNote.setText(String.format(Locale.ROOT, "Colour range: enter numbers, e.g. -2e-7 and 2e-7 (got '%s', '%s').",
                    minField.getText(), maxField.getText()));
            return;
        }
        showRange();
        map.redraw();
    }

    private static final class LayerCell extends ListCell<MapLayer> {
        private final CheckBox box = new CheckBox();
        private MapLayer bound;

        @Override
        protected void updateItem(MapLayer item, boolean empty) {
            super.updateItem(item, empty);
            if (bound != null) box.selectedProperty().unbindBidirectional(bound.visibleProperty());
            bound = null;
            if (empty || item == null) {
                setGraphic(null);
                setText(null);
                return;
            }
            box.setText(item.title());
            box.selectedProperty().bindBidirectional(item.visibleProperty());
            bound = item;
            setGraphic(box);
            setText(null);
        }
    }
}
