package org.inkgate.client.testutil;

import java.util.Objects;
import javafx.geometry.Rectangle2D;
import javafx.stage.Screen;
import javafx.stage.Stage;

/**
 * A window size a test needs, given to the primary stage that TestFX shares between all test
 * classes of the JVM, and the stage's earlier state put back afterwards.
 *
 * <p>Whatever a test class leaves on that stage (full screen from a lock, bounds from a layout
 * walk, the practice window's minimum size) is what the next class starts with; a picture or a
 * layout assertion that depends on the window's size therefore sets the size itself, here, and
 * never relies on the screen's or an earlier test's. The headless screen itself is one value for
 * the whole test JVM (the client pom's {@code headless.geometry}); a window size is chosen per test.
 *
 * <pre>
 * &#64;Start void start(Stage primary) { size = StageSize.set(primary, 1280, 800); }
 * &#64;AfterEach void restore(FxRobot robot) { robot.interact(size::restore); }
 * </pre>
 */
public final class StageSize {

    private final Stage stage;
    private final boolean fullScreen;
    private final boolean maximized;
    private final double x;
    private final double y;
    private final double width;
    private final double height;
    private final double minWidth;
    private final double minHeight;
    private final double maxWidth;
    private final double maxHeight;

    private StageSize(Stage stage) {
        this.stage = stage;
        fullScreen = stage.isFullScreen();
        maximized = stage.isMaximized();
        x = stage.getX();
        y = stage.getY();
        width = stage.getWidth();
        height = stage.getHeight();
        minWidth = stage.getMinWidth();
        minHeight = stage.getMinHeight();
        maxWidth = stage.getMaxWidth();
        maxHeight = stage.getMaxHeight();
    }

    /**
     * Remembers the stage's state, then makes it an ordinary window of exactly this size at the
     * screen's top-left corner: not full screen, not maximised, no minimum or maximum size left
     * over. Call on the JavaFX thread.
     */
    public static StageSize set(Stage stage, double width, double height) {
        StageSize before = new StageSize(Objects.requireNonNull(stage, "stage"));
        apply(stage, width, height);
        return before;
    }

    /** Gives the stage this size without remembering anything (a test walking several sizes). JavaFX thread. */
    public static void apply(Stage stage, double width, double height) {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("a window size must be positive, not " + width + "x" + height);
        }
        Rectangle2D screen = Screen.getPrimary().getBounds();
        if (width > screen.getWidth() || height > screen.getHeight()) {
            // the headless framebuffer is the screen's size: a bigger window overflows it
            throw new IllegalStateException("a test asks for a " + width + "x" + height + " window but the headless screen is "
                    + screen.getWidth() + "x" + screen.getHeight() + "; raise headless.geometry in delivery-client/app/pom.xml");
        }
        stage.setFullScreen(false);
        stage.setMaximized(false);
        stage.setMinWidth(0);
        stage.setMinHeight(0);
        stage.setMaxWidth(Double.MAX_VALUE);
        stage.setMaxHeight(Double.MAX_VALUE);
        stage.setX(0);
        stage.setY(0);
        stage.setWidth(width);
        stage.setHeight(height);
    }

    /** Puts back the state {@link #set} found. Call on the JavaFX thread. */
    public void restore() {
        stage.setFullScreen(false);
        stage.setMaximized(false);
        stage.setMinWidth(minWidth);
        stage.setMinHeight(minHeight);
        stage.setMaxWidth(maxWidth);
        stage.setMaxHeight(maxHeight);
        if (!Double.isNaN(width) && !Double.isNaN(height)) {
            stage.setX(x);
            stage.setY(y);
            stage.setWidth(width);
            stage.setHeight(height);
        }
        stage.setMaximized(maximized);
        stage.setFullScreen(fullScreen);
    }
}
