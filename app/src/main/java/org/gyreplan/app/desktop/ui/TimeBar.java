package org.gyreplan.app.desktop.ui;

import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.beans.property.IntegerProperty;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Slider;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.util.Duration;

import java.util.ArrayList;
import java.util.List;

/**
 * The time control: play/pause, step back/forward, a slider over the time steps and the current step's label.
 * Bound to the map's time-step property, so map, inspector and charts follow it.
 */
public class TimeBar extends HBox {
    private final Slider slider = new Slider(0, 0, 0);
    private final Button play = new Button("▶ Play");
    private final Label label = new Label("—");
    private final Timeline timeline;
    private final List<String> labels = new ArrayList<>();
    private final IntegerProperty step;

    public TimeBar(IntegerProperty step) {
        this.step = step;
        setSpacing(8);
        setAlignment(Pos.CENTER_LEFT);
        setPadding(new Insets(4, 8, 4, 8));
        slider.setId("timeSlider");
        play.setId("playButton");
        label.setId("timeLabel");
        label.setMinWidth(110);
        slider.setMajorTickUnit(1);
        slider.setMinorTickCount(0);
        slider.setSnapToTicks(true);
        slider.setBlockIncrement(1);
        HBox.setHgrow(slider, Priority.ALWAYS);
        Button back = new Button("◀"), fwd = new Button("▶|");
        back.setId("stepBack");
        fwd.setId("stepForward");
        back.setOnAction(e -> setStep(step.get() - 1));
        fwd.setOnAction(e -> setStep(step.get() + 1));
        slider.valueProperty().addListener((o, a, b) -> {
            int k = (int) Math.round(b.doubleValue());
            if (k != step.get()) step.set(k);
        });
        step.addListener((o, a, b) -> {
            if ((int) Math.round(slider.getValue()) != b.intValue()) slider.setValue(b.intValue());
            updateLabel();
        });
        timeline = new Timeline(new KeyFrame(Duration.millis(700), e -> {
            int n = labels.size();
            if (n > 1) setStep((step.get() + 1) % n);
        }));
        timeline.setCycleCount(Timeline.INDEFINITE);
        play.setOnAction(e -> setPlaying(timeline.getStatus() != javafx.animation.Animation.Status.RUNNING));
        Label t = new Label("Time");
        getChildren().addAll(t, play, back, fwd, slider, label);
        setSteps(List.of());
    }

    public Slider slider() { return slider; }

    /** Sets the step labels (empty = no time dimension: the bar is disabled). */
    public void setSteps(List<String> stepLabels) {
        setPlaying(false);
        labels.clear();
        labels.addAll(stepLabels);
        int n = Math.max(1, labels.size());
        slider.setMax(n - 1);
        slider.setShowTickMarks(n > 1 && n <= 48);
        setDisable(labels.size() <= 1);
        if (step.get() >= n) step.set(0);
        updateLabel();
    }

    public void setStep(int k) {
        int n = Math.max(1, labels.size());
        step.set(Math.max(0, Math.min(n - 1, k)));
    }

    public boolean isPlaying() { return timeline.getStatus() == javafx.animation.Animation.Status.RUNNING; }

    public void setPlaying(boolean on) {
        if (on && labels.size() > 1) {
            timeline.play();
            play.setText("❚❚ Pause");
        } else {
            timeline.stop();
            play.setText("▶ Play");
        }
    }

    /** Label of the current step, or null when there is no time dimension. */
    public String currentLabel() {
        int k = step.get();
        return k >= 0 && k < labels.size() ? labels.get(k) : null;
    }

    private void updateLabel() {
        String s = currentLabel();
        label.setText(s == null ? "time-independent" : s + "  (" + (step.get() + 1) + "/" + labels.size() + ")");
    }
}
