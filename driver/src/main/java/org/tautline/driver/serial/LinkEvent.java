package org.tautline.driver.serial;

import org.tautline.driver.RigLinkException;

/** Something the host received, in arrival order: a reply line, a data block, a damaged block, a status, garbage. */
sealed interface LinkEvent {
    /** @param text an ordinary reply line, or an {@code !ERR} line standing in for one */
    record Reply(String text) implements LinkEvent {
    }

    /** @param block a data block whose CRC matched */
    record Block(DataBlock block) implements LinkEvent {
    }

    /** @param fault a data block whose CRC did not match */
    record Damaged(RigLinkException fault) implements LinkEvent {
    }

    /** @param status a {@code LINK:STAT?} reply whose check matched */
    record Status(DeviceStatus status) implements LinkEvent {
    }

    /** @param what an unreadable line, or a status line whose check failed */
    record Garbled(String what) implements LinkEvent {
    }
}
