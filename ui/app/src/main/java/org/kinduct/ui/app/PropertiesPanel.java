package org.kinduct.ui.app;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.UnaryOperator;
import javafx.collections.SetChangeListener;
import javafx.geometry.Insets;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Control;
import javafx.scene.control.Hyperlink;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Separator;
import javafx.scene.control.TextField;
import javafx.scene.layout.VBox;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.MotionSheet;
import org.kinduct.ui.edit.Property;
import org.kinduct.ui.edit.PropertySheet;

/**
 * Properties of the selection (or of the scene when nothing is selected) and the motion editor.
 * Text fields accept values with units; a value that is not accepted goes back to the last valid
 * one, the status line says why, and the scene is left as it was.
 */
final class PropertiesPanel extends ScrollPane {

    private final EditorViewModel vm;
    private final VBox box = new VBox(4);

    PropertiesPanel(EditorViewModel vm) {
        this.vm = vm;
        setId("properties");
        setContent(box);
        setFitToWidth(true);
        setMinWidth(250);
        box.setPadding(new Insets(8));
        vm.document().selection().addListener((SetChangeListener<String>) c -> rebuild());
        vm.document().sceneProperty().addListener(o -> rebuild());
        rebuild();
    }

    private void rebuild() {
        box.getChildren().clear();
        Scene scene = vm.scene();
        Set<String> selection = vm.document().selection();
        if (selection.size() > 1) {
            heading(selection.size() + " objects selected");
            note("Drag to move them together; Ctrl+D duplicates, Ctrl+R rotates, Delete removes.");
            return;
        }
        String id = selection.isEmpty() ? null : selection.iterator().next();
        heading(id == null ? "Scene" : describe(scene, id));
        addAll(PropertySheet.of(scene, id));
        Hyperlink vary = new Hyperlink(id == null ? "Vary a value of the scene…" : "Vary a value of " + id + "…");
        vary.setId("vary-value");
        vary.setOnAction(e -> SweepWindow.show(getScene().getWindow(), vm, id));
        box.getChildren().add(vary);
        if (id != null) {
            box.getChildren().add(new Separator());
            heading("Motion");
            addAll(MotionSheet.of(scene, id));
        } else {
            note("Select an object to edit it; pick a tool above to draw one.");
        }
    }

    private static String describe(Scene scene, String id) {
        String kind = scene.source(id).map(PropertiesPanel::kind)
                .orElseGet(() -> scene.conductor(id).map(PropertiesPanel::kind).orElse("Object"));
        return kind + " “" + id + "”";
    }

    private static String kind(Source s) {
        return s.match(new Source.Cases<>() {
            @Override
            public String patch(Source.FieldPatch patch) {
                return "Field patch";
            }

            @Override
            public String uniform(Source.UniformField uniform) {
                return "Uniform field";
            }

            @Override
            public String block(Source.BlockMagnet block) {
                return "Block magnet";
            }

            @Override
            public String cylinder(Source.CylinderMagnet cylinder) {
                return "Disc magnet";
            }

            @Override
            public String coil(Source.SourceCoil coil) {
                return "Source coil";
            }

            @Override
            public String map(Source.FieldMap map) {
                return "Field map";
            }
        });
    }

    private static String kind(Conductor c) {
        return c.match(new Conductor.Cases<>() {
            @Override
            public String wire(Conductor.Wire wire) {
                return "Wire";
            }

            @Override
            public String loop(Conductor.Loop loop) {
                return "Loop";
            }

            @Override
            public String plate(Conductor.Plate plate) {
                return "Plate";
            }

            @Override
            public String channel(Conductor.Channel channel) {
                return "Liquid channel";
            }
        });
    }

    private void heading(String text) {
        Label l = new Label(text);
        l.setStyle("-fx-font-weight: bold; -fx-font-size: 13px;");
        l.setWrapText(true);
        box.getChildren().add(l);
    }

    private void note(String text) {
        Label l = new Label(text);
        l.setWrapText(true);
        l.setStyle("-fx-text-fill: #555555;");
        box.getChildren().add(l);
    }

    private void addAll(List<Property> props) {
        for (Property p : props) {
            Label label = new Label(p.label());
            Control control = p.isChoice() ? choice(p) : text(p);
            control.setId(idFor(p));
            control.setMaxWidth(Double.MAX_VALUE);
            box.getChildren().addAll(label, control);
        }
    }

    static String idFor(Property p) {
        String slug = p.label().toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        return "prop-" + slug;
    }

    private TextField text(Property p) {
        TextField f = new TextField(p.text());
        Runnable commit = () -> {
            if (!f.getText().equals(p.text()) && !commit(p, f.getText())) {
                f.setText(p.text());
            }
        };
        f.setOnAction(e -> commit.run());
        f.focusedProperty().addListener((obs, was, focused) -> {
            if (!focused) {
                commit.run();
            }
        });
        return f;
    }

    private ComboBox<String> choice(Property p) {
        ComboBox<String> c = new ComboBox<>();
        c.getItems().setAll(p.options());
        c.setValue(p.text());
        c.setOnAction(e -> {
            if (c.getValue() != null && !c.getValue().equals(p.text()) && !commit(p, c.getValue())) {
                c.setValue(p.text());
            }
        });
        return c;
    }

    /**
     * Applies {@code typed}; false, with the reason and the value kept on the status line, when the
     * input or the scene it would make is refused.
     */
    private boolean commit(Property p, String typed) {
        UnaryOperator<Scene> edit;
        try {
            edit = p.check(vm.scene(), typed);
        } catch (IllegalArgumentException e) {
            vm.say(p.label() + ": " + e.getMessage() + " — kept " + p.text());
            return false;
        }
        return vm.document().apply("Set " + p.label().toLowerCase(Locale.ROOT), edit);
    }
}
