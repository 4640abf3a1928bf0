package org.gyreplan.app.desktop.ui;

import javafx.geometry.Insets;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.gyreplan.app.desktop.study.PointSeries;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.List;
import java.util.Locale;

/**
 * Charts of one index point: the series with the current time step marked, the monthly climatology, and the
 * cumulative index with the season start and end dates. Time axes are in decimal years (UTC).
 */
public class ChartPane extends VBox {
    private static final String[] MONTHS = {"Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"};
    private final Label title = new Label("Click an index point on the map to see its series, climatology and cumulative index.");
    private final LineChart<Number, Number> series = chart("Series", yearAxis());
    private final LineChart<Number, Number> climatology = chart("Monthly climatology", monthAxis());
    private final LineChart<Number, Number> cumulative = chart("Cumulative index and season", yearAxis());
    private final XYChart.Series<Number, Number> marker = new XYChart.Series<>();
    private final HBox row;
    private PointSeries shown;
    private String shownId;

    public ChartPane() {
        setId("chartPane");
        setPadding(new Insets(4, 8, 4, 8));
        setSpacing(2);
        title.getStyleClass().add("panel-subtitle");
        row = new HBox(4, series, climatology, cumulative);
        row.setVisible(false);
        row.setManaged(false);
        for (LineChart<Number, Number> c : List.of(series, climatology, cumulative)) HBox.setHgrow(c, Priority.ALWAYS);
        VBox.setVgrow(row, Priority.ALWAYS);
        getChildren().addAll(title, row);
        marker.setName("This step");
    }

    /** Id of the point shown, or null. */
    public String shownId() { return shownId; }
    public LineChart<Number, Number> seriesChart() { return series; }
    public LineChart<Number, Number> climatologyChart() { return climatology; }
    public LineChart<Number, Number> cumulativeChart() { return cumulative; }

    /** Shows a point's charts. */
    public void show(String id, String label, PointSeries s, int timeStep) {
        shown = s;
        shownId = id;
        row.setVisible(true);
        row.setManaged(true);
        title.setText(label + " — " + s.quantity() + " (" + s.units() + ")");
        series.getData().clear();
        climatology.getData().clear();
        cumulative.getData().clear();
        ((NumberAxis) series.getYAxis()).setLabel(s.units());
        ((NumberAxis) climatology.getYAxis()).setLabel(s.units());
        ((NumberAxis) cumulative.getYAxis()).setLabel(s.cumulativeUnits());

        XYChart.Series<Number, Number> v = new XYChart.Series<>();
        v.setName(s.quantity());
        for (int k = 0; k < s.times().size(); k++) {
            if (Double.isFinite(s.values()[k])) v.getData().add(new XYChart.Data<>(year(s.times().get(k)), s.values()[k]));
        }
        hideSymbolsIfDense(v);
        series.getData().add(v);
        marker.getData().clear();
        series.getData().add(marker);
        setTimeStep(timeStep);
        fitYearAxis(series, s.times());

        if (s.climatology().length == 12) {
            XYChart.Series<Number, Number> c = new XYChart.Series<>();
            c.setName("Mean by month");
            for (int m = 0; m < 12; m++) {
                if (Double.isFinite(s.climatology()[m])) c.getData().add(new XYChart.Data<>(m + 1, s.climatology()[m]));
            }
            climatology.getData().add(c);
        }
        if (s.cumulative().length > 0) {
            // one curve per calendar year (the index restarts each year)
            XYChart.Series<Number, Number> c = null;
            int curYear = Integer.MIN_VALUE;
            for (int k = 0; k < s.cumulativeTimes().size(); k++) {
                int y = s.cumulativeTimes().get(k).atZone(ZoneOffset.UTC).getYear();
                if (c == null || y != curYear) {
                    if (c != null) { hideSymbolsIfDense(c); cumulative.getData().add(c); }
                    c = new XYChart.Series<>();
                    c.setName(String.valueOf(y));
                    curYear = y;
                }
                if (Double.isFinite(s.cumulative()[k])) c.getData().add(new XYChart.Data<>(year(s.cumulativeTimes().get(k)), s.cumulative()[k]));
            }
            if (c != null) { hideSymbolsIfDense(c); cumulative.getData().add(c); }
            cumulative.getData().add(dates("Season start", s.seasonStarts(), s));
            cumulative.getData().add(dates("Season end", s.seasonEnds(), s));
            fitYearAxis(cumulative, s.cumulativeTimes());
        }
    }

    private java.util.function.IntFunction<Instant> stepTime = k -> null;

    /** How a time step maps to an instant (null = the step indexes the series directly). */
    public void setStepTimes(java.util.function.IntFunction<Instant> f) { stepTime = f == null ? k -> null : f; }

    /** Moves the "this step" marker (series chart) to a time step: the series value nearest the step's time. */
    public void setTimeStep(int timeStep) {
        if (shown == null) return;
        marker.getData().clear();
        int k = timeStep;
        Instant t = stepTime.apply(timeStep);
        if (t != null) {
            k = 0;
            for (int q = 1; q < shown.times().size(); q++) {
                if (Math.abs(shown.times().get(q).getEpochSecond() - t.getEpochSecond())
                        < Math.abs(shown.times().get(k).getEpochSecond() - t.getEpochSecond())) k = q;
            }
        }
        if (k >= 0 && k < shown.times().size() && Double.isFinite(shown.values()[k])) {
            marker.getData().add(new XYChart.Data<>(year(shown.times().get(k)), shown.values()[k]));
        }
    }

    /** Decimal year of the "this step" marker, or NaN. */
    public double markerYear() {
        return marker.getData().isEmpty() ? Double.NaN : marker.getData().get(0).getXValue().doubleValue();
    }

    /** Long series are drawn as lines only: every point gets an empty node instead of a symbol. */
    private static void hideSymbolsIfDense(XYChart.Series<Number, Number> s) {
        if (s.getData().size() <= 60) return;
        for (XYChart.Data<Number, Number> d : s.getData()) d.setNode(new javafx.scene.Group());
    }

    private static XYChart.Series<Number, Number> dates(String name, List<Instant> when, PointSeries s) {
        XYChart.Series<Number, Number> out = new XYChart.Series<>();
        out.setName(name);
        for (Instant t : when) {
            // mark on the cumulative curve at the nearest time
            List<Instant> ct = s.cumulativeTimes();
            int best = 0;
            for (int k = 1; k < ct.size(); k++) {
                if (Math.abs(ct.get(k).getEpochSecond() - t.getEpochSecond())
                        < Math.abs(ct.get(best).getEpochSecond() - t.getEpochSecond())) best = k;
            }
            if (!ct.isEmpty() && Double.isFinite(s.cumulative()[best])) {
                out.getData().add(new XYChart.Data<>(year(t), s.cumulative()[best]));
            }
        }
        return out;
    }

    /** Decimal year of an instant (UTC): year + elapsed fraction of that year. */
    public static double year(Instant t) {
        ZonedDateTime z = t.atZone(ZoneOffset.UTC);
        ZonedDateTime start = ZonedDateTime.of(z.getYear(), 1, 1, 0, 0, 0, 0, ZoneOffset.UTC);
        double len = start.plusYears(1).toEpochSecond() - start.toEpochSecond();
        return z.getYear() + (t.getEpochSecond() - start.toEpochSecond()) / len;
    }

    private static void fitYearAxis(LineChart<Number, Number> c, List<Instant> times) {
        if (times.isEmpty()) return;
        NumberAxis x = (NumberAxis) c.getXAxis();
        double a = year(times.get(0)), b = year(times.get(times.size() - 1));
        if (b <= a) b = a + 1;
        x.setAutoRanging(false);
        x.setLowerBound(Math.floor(a * 12) / 12);
        x.setUpperBound(Math.ceil(b * 12) / 12);
        double span = b - a;
        x.setTickUnit(span > 8 ? 2 : span > 3 ? 1 : span > 1.2 ? 0.5 : 0.25);
    }

    private static LineChart<Number, Number> chart(String name, NumberAxis x) {
        NumberAxis y = new NumberAxis();
        y.setForceZeroInRange(true);
        LineChart<Number, Number> c = new LineChart<>(x, y);
        c.setTitle(name);
        c.setAnimated(false);
        c.setCreateSymbols(true);
        c.setLegendVisible(true);
        c.setMinWidth(160);
        c.getStyleClass().add("study-chart");
        return c;
    }

    private static NumberAxis yearAxis() {
        NumberAxis x = new NumberAxis();
        x.setForceZeroInRange(false);
        x.setLabel("Year (UTC)");
        x.setTickLabelFormatter(new StringConverter<>() {
            @Override public String toString(Number n) {
                double v = n.doubleValue();
                int y = (int) Math.floor(v + 1e-9);
                int m = (int) Math.round((v - y) * 12);
                if (m == 12) { y++; m = 0; }
                return m == 0 ? String.valueOf(y) : MONTHS[m] + " " + y;
            }
            @Override public Number fromString(String s) { return Double.parseDouble(s); }
        });
        return x;
    }

    private static NumberAxis monthAxis() {
        NumberAxis x = new NumberAxis(0.5, 12.5, 1);
        x.setAutoRanging(false);
        x.setLabel("Month");
        x.setTickLabelFormatter(new StringConverter<>() {
            @Override public String toString(Number n) {
                int m = (int) Math.rint(n.doubleValue());
                return m >= 1 && m <= 12 && Math.abs(n.doubleValue() - m) < 1e-9 ? MONTHS[m - 1] : "";
            }
            @Override public Number fromString(String s) { return 0; }
        });
        return x;
    }
}
