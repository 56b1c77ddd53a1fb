package org.kinduct.ui.edit;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableMap;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;

/**
 * The demo browser's state: one entry per demo (title and the opening of its description), the
 * chosen entry, and thumbnails that arrive as they are rendered on {@code work}. Needs no running
 * toolkit; a demo whose thumbnail fails to render simply has none.
 */
public final class DemoBrowserModel {

    /** Summaries stop after the sentence that reaches this length. */
    static final int SUMMARY_MIN_CHARS = 110;
    /** A summary never runs longer than this, however long its first sentence. */
    static final int SUMMARY_MAX_CHARS = 260;
    /** A sentence ends at . ? or ! followed by space and a capital (so "0.25 m/s" and "e.g. x" do not end one). */
    private static final Pattern SENTENCE_END = Pattern.compile("[.?!](?=\\s+\\p{Lu})");

    /** One demo: its catalogue name, title, summary and the scene itself. */
    public record Entry(String name, String title, String summary, Scene scene) {
    }

    private final List<Entry> entries;
    private final ObservableMap<String, BufferedImage> thumbnails = FXCollections.observableHashMap();
    private final ObjectProperty<Entry> chosen = new SimpleObjectProperty<>();

    public DemoBrowserModel(List<String> names, Function<String, Scene> loader) {
        List<Entry> list = new ArrayList<>();
        for (String name : names) {
            Scene s = loader.apply(name);
            list.add(new Entry(name, s.name().isEmpty() ? name.replace('-', ' ') : s.name(),
                    summary(s.description()), s));
        }
        this.entries = List.copyOf(list);
    }

    /** The demos shipped with Kinduct. */
    public static DemoBrowserModel shipped() {
        return new DemoBrowserModel(Demos.names(), Demos::load);
    }

    /** Renders every thumbnail on {@code work}, one task per demo, handing each to {@code ui} when done. */
    public void renderThumbnails(Function<Scene, BufferedImage> renderer, Executor work, Executor ui) {
        for (Entry e : entries) {
            work.execute(() -> {
                BufferedImage img;
                try {
                    img = renderer.apply(e.scene());
                } catch (RuntimeException failure) {
                    System.err.println("Kinduct: no thumbnail for demo " + e.name() + ": " + failure.getMessage());
                    return;
                }
                ui.execute(() -> thumbnails.put(e.name(), img));
            });
        }
    }

    /** The first sentences of {@code description}: at least {@value #SUMMARY_MIN_CHARS} characters where there are. */
    public static String summary(String description) {
        String text = description.strip().replaceAll("\\s+", " ");
        Matcher m = SENTENCE_END.matcher(text);
        int end = text.length();
        while (m.find()) {
            if (m.end() >= SUMMARY_MIN_CHARS) {
                end = m.end();
                break;
            }
        }
        if (end <= SUMMARY_MAX_CHARS) {
            return text.substring(0, end);
        }
        int cut = text.lastIndexOf(' ', SUMMARY_MAX_CHARS - 1);
        return text.substring(0, cut > 0 ? cut : SUMMARY_MAX_CHARS - 1) + "…";
    }

    public List<Entry> entries() {
        return entries;
    }

    public ObservableMap<String, BufferedImage> thumbnails() {
        return thumbnails;
    }

    public ObjectProperty<Entry> chosenProperty() {
        return chosen;
    }
}
