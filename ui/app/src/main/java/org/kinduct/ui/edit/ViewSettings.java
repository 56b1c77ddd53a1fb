package org.kinduct.ui.edit;

import java.util.EnumSet;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableSet;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.ScenePainter;
import org.kinduct.render.view.NiceSteps;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.render.view.ViewTransform;

/**
 * How the scene is looked at and drawn in: the view transform, the colour range, the layers
 * shown, the tool, and snapping.
 */
public final class ViewSettings {

    /** Grid snapping uses the smallest round step at least this many screen pixels long. */
    private static final double GRID_SNAP_PX = 12;
    /** Zoom to fit leaves this fraction of the scene's extent free on each side. */
    private static final double FIT_PADDING = 0.08;
    private static final double FIT_MARGIN_PX = 30;

    private final ObjectProperty<ViewTransform> view = new SimpleObjectProperty<>(ViewTransform.initial(800, 600));
    private final ObjectProperty<ColourRange> range = new SimpleObjectProperty<>(ColourRange.automatic());
    private final ObservableSet<Layer> layers = FXCollections.observableSet(EnumSet.complementOf(
            EnumSet.of(Layer.SYMBOLS)));
    private final ObjectProperty<ToolKind> tool = new SimpleObjectProperty<>(ToolKind.SELECT);
    private final BooleanProperty snapToGrid = new SimpleBooleanProperty(true);
    private final BooleanProperty snapAngles = new SimpleBooleanProperty(true);
    /** The view the last zoom-to-fit made. */
    private ViewTransform fitted;

    ViewSettings() {
    }

    /** Shows the box {@code b} (scene metres), with some room round it and beside the legend. */
    void fit(SceneBounds b) {
        double padX = (b.maxX() - b.minX()) * FIT_PADDING;
        double padY = (b.maxY() - b.minY()) * FIT_PADDING;
        double legend = layers.contains(Layer.LEGEND) ? ScenePainter.LEGEND_SPAN_PX : 0;
        fitted = view.get().fitting(b.minX() - padX, b.minY() - padY, b.maxX() + padX, b.maxY() + padY,
                FIT_MARGIN_PX, legend);
        view.set(fitted);
    }

    /** Whether the view is still the one the last zoom-to-fit made (the user has not moved it since). */
    boolean stillFitted() {
        return fitted != null && fitted.equals(view.get());
    }

    /** Whether a field layer is shown, so field maps are worth computing. */
    public boolean showsField() {
        return layers.contains(Layer.HEAT_MAP) || layers.contains(Layer.CONTOURS) || layers.contains(Layer.SYMBOLS);
    }

    /** Snapping as set, at the current zoom. */
    public Snapper snapper() {
        ViewTransform v = view.get();
        double grid = snapToGrid.get() ? NiceSteps.atLeast(GRID_SNAP_PX / v.pxPerM()) : 0;
        return new Snapper(grid, Picker.REACH_PX / v.pxPerM(), snapAngles.get());
    }

    public ViewTransform view() {
        return view.get();
    }

    public ObjectProperty<ViewTransform> viewProperty() {
        return view;
    }

    public ObjectProperty<ColourRange> rangeProperty() {
        return range;
    }

    public ObservableSet<Layer> layers() {
        return layers;
    }

    public ObjectProperty<ToolKind> toolProperty() {
        return tool;
    }

    public BooleanProperty snapToGridProperty() {
        return snapToGrid;
    }

    public BooleanProperty snapAnglesProperty() {
        return snapAngles;
    }
}
