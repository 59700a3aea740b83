package org.inkgate.admin.gui;

import javafx.scene.Node;

/** One step of the admin window: its name in the step list, its view and where focus starts. */
public interface Step {

    String title();

    Node view();

    Node firstFocus();
}
