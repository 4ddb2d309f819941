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

    /**
     * Takes the result off the results screen (a new or another project): it is no longer exported or added to a lot.
     *
     * @param why what happened, as a sentence, shown on the empty results screen
     */
    void noResult(String why);
}
