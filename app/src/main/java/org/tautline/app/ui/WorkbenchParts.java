package org.tautline.app.ui;

import javax.swing.JFrame;

/** The screens of one workbench window, handed to the controllers that drive them. */
interface WorkbenchParts {
    JFrame frame();

    SetupScreen setup();

    RigScreen rig();

    RunScreen run();

    ResultsScreen results();

    StatusBar status();

    /** Brings the setup screen to the front. */
    void showSetup();
}
