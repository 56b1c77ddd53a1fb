package org.kinduct.ui.app;

import java.util.List;
import java.util.Optional;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;
import org.kinduct.scene.units.Units;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.PlotSeries;
import org.kinduct.render.paint.Quantities;

/**
 * A conductor quantity (EMF, current, flux linkage, force) or a body quantity (position, speed)
 * over the scene's time window, lines chosen by {@link PlotSeries}, with a cursor at the current
 * time; clicking seeks.
 */
final class TimePlot extends Pane {

    /** Said while coarse samples stand in for the run being computed. */
    static final String FILLING = " — filling in (coarse samples until the run is done)…";

    private static final Color[] LINE_COLOURS = {
        Color.web("#1b6ca8"), Color.web("#c65d00"), Color.web("#4b1d8f"), Color.web("#2f7d32"), Color.web("#8a1c3c")};
    private static final double LEFT = 70;
    private static final double BOTTOM = 20;

    private final EditorViewModel vm;
    private final Canvas canvas = new Canvas();
    private PlotSeries.Quantity quantity = PlotSeries.Quantity.EMF;
    /** The lines of the current run, selection and quantity; a move of the time cursor only redraws them. */
    private List<PlotSeries.Line> lines = List.of();
    private double peak;

    TimePlot(EditorViewModel vm) {
        this.vm = vm;
        getChildren().add(canvas);
        setMinSize(200, 100);
        setPrefHeight(170);
        canvas.widthProperty().bind(widthProperty());
        canvas.heightProperty().bind(heightProperty());
        widthProperty().addListener(o -> draw());
        heightProperty().addListener(o -> draw());
        vm.results().resultProperty().addListener(o -> relines());
        vm.results().previewProperty().addListener(o -> relines());
        vm.document().sceneProperty().addListener(o -> relines());
        vm.clock().timeProperty().addListener(o -> draw());
        vm.document().selection().addListener((javafx.collections.SetChangeListener<String>) c -> relines());
        setOnMouseClicked(e -> seek(e.getX()));
        setOnMouseDragged(e -> seek(e.getX()));
        relines();
    }

    void setQuantity(PlotSeries.Quantity q) {
        quantity = q;
        relines();
    }

    /** Takes the lines from the current scene's run (none while it is computed). */
    private void relines() {
        lines = vm.results().currentResult().or(() -> Optional.ofNullable(vm.results().previewProperty().get()))
                .map(run -> PlotSeries.lines(run, vm.document().selection(), quantity)).orElse(List.of());
        peak = 0;
        for (PlotSeries.Line line : lines) {
            for (double v : line.values()) {
                if (Double.isFinite(v)) {
                    peak = Math.max(peak, Math.abs(v));
                }
            }
        }
        draw();
    }

    /** Whether the lines drawn are the coarse preview while the full run is computed. */
    private boolean filling() {
        return vm.results().currentResult().isEmpty();
    }

    /** Why there are no lines: the run is still being computed, or there is nothing to plot. */
    private String emptyNote() {
        if (vm.results().currentResult().isEmpty()) {
            return " — computing the run…";
        }
        return switch (quantity) {
            case POSITION_X, POSITION_Y, SPEED -> " — no moving bodies";
            case PAIR_VOLTAGE -> " — no electrode pairs";
            case DRAG, TORQUE, JOULE_HEAT -> " — no plates or channels";
            case EMF, CURRENT, FLUX, FORCE_X, FORCE_Y -> " — no wires or loops";
        };
    }

    private void seek(double x) {
        double t0 = vm.scene().time().t0S();
        double t1 = vm.scene().time().t1S();
        double w = getWidth() - LEFT - 10;
        if (w > 0) {
            vm.clock().seek(t0 + (x - LEFT) / w * (t1 - t0));
        }
    }

    private void draw() {
        GraphicsContext g = canvas.getGraphicsContext2D();
        double w = getWidth();
        double h = getHeight();
        g.setFill(Color.web("#fbfbf8"));
        g.fillRect(0, 0, w, h);
        double t0 = vm.scene().time().t0S();
        double t1 = vm.scene().time().t1S();
        double pw = w - LEFT - 10;
        double ph = h - BOTTOM - 22;
        if (pw <= 10 || ph <= 10) {
            return;
        }
        double lim = peak > 0 ? peak * 1.1 : 1;
        double top = 18;
        g.setStroke(Color.web("#bbbbbb"));
        g.setLineWidth(1);
        g.strokeRect(LEFT, top, pw, ph);
        g.setStroke(Color.web("#888888"));
        g.strokeLine(LEFT, top + ph / 2, LEFT + pw, top + ph / 2);
        g.setFill(Color.web("#333333"));
        g.setFont(Font.font("DejaVu Sans", 11));
        g.setTextAlign(TextAlignment.RIGHT);
        g.fillText(peak > 0 ? "+" + Units.format(lim, quantity.dimension) : "", LEFT - 4, top + 10);
        g.fillText("0", LEFT - 4, top + ph / 2 + 4);
        g.fillText(peak > 0 ? "−" + Units.format(lim, quantity.dimension) : "", LEFT - 4, top + ph);
        g.setTextAlign(TextAlignment.LEFT);
        g.fillText(quantity + (lines.isEmpty() ? emptyNote() : filling() ? FILLING : ""), LEFT, 13);
        g.fillText(Quantities.time(t0), LEFT, h - 5);
        g.setTextAlign(TextAlignment.RIGHT);
        g.fillText(Quantities.time(t1), LEFT + pw, h - 5);
        for (int k = 0; k < lines.size(); k++) {
            PlotSeries.Line line = lines.get(k);
            Color col = LINE_COLOURS[k % LINE_COLOURS.length];
            g.setStroke(col);
            g.setLineWidth(1.6);
            g.beginPath();
            boolean started = false;
            for (int i = 0; i < line.tS().length; i++) {
                double v = line.values()[i];
                if (!Double.isFinite(v)) {
                    continue;
                }
                double x = LEFT + (line.tS()[i] - t0) / (t1 - t0) * pw;
                double y = top + ph / 2 - v / lim * ph / 2;
                if (started) {
                    g.lineTo(x, y);
                } else {
                    g.moveTo(x, y);
                    started = true;
                }
            }
            g.stroke();
            g.setFill(col);
            g.setTextAlign(TextAlignment.RIGHT);
            g.fillText(line.id(), LEFT + pw - 4, top + 12 + 13 * k);
        }
        double tx = LEFT + (vm.clock().time() - t0) / (t1 - t0) * pw;
        g.setStroke(Color.web("#d6007a"));
        g.setLineWidth(1.5);
        g.strokeLine(tx, top, tx, top + ph);
    }
}
