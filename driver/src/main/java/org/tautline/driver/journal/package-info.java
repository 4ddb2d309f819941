/**
 * The sweep journal: an append-only, fsynced record of every completed step of any sweep plan, read back after any
 * interruption and resumed.
 *
 * <h2>Journal file</h2>
 * Text, US-ASCII, one record per line ending in a line feed (0x0A; a
 * carriage return before it, as a Windows editor may leave, is ignored):
 * <pre>TYPE key=value key=value ... crc=HHHHHHHH</pre>
 * {@code crc} is the CRC-32 (the ISO-HDLC polynomial of {@link java.util.zip.CRC32}) of every byte of
 * the line before {@code " crc="}, as eight upper-case hex digits. Values are percent-encoded: every
 * UTF-8 byte other than letters, digits and {@code . _ , : + - /} is written {@code %XX}, so values
 * never hold a space, {@code =} or a line feed. Numbers are Java's shortest round-trip decimal form
 * ({@link Double#toString(double)}), so they read back bit for bit; times are ISO-8601 UTC instants.
 * Records, in order:
 * <ul>
 *   <li>{@code HEADER}, once, first: {@code format=tautline-journal version=2 startedAt driver
 *       option.NAME=VALUE...} (every option the rig was opened with, defaults included) {@code identity
 *       sampleRateHz channels=N channel.I.name channel.I.quantity channel.I.unit}, then the whole sweep plan:
 *       {@code plan.startHz plan.stopHz plan.coarseSteps plan.settleTolerance} (0 for a fixed dwell)
 *       {@code plan.settleCycles plan.minSettleS plan.integrationCycles plan.levelMode=force|drive plan.levels}
 *       (comma-separated) {@code plan.limits.driveV plan.limits.forceN plan.limits.responseAmplitude
 *       plan.limits.displacementM plan.direction=up|down|both plan.refinement=yes|none} (with
 *       {@code plan.frequencyRelStd plan.dampingRelStd plan.timeBudgetS} when yes) {@code plan.initialDampingRatio
 *       plan.levelTolerance plan.initialDriveV plan.driveRateVPerS plan.rampS plan.harmonicOrder}, and
 *       {@code samples=FILE|none}.</li>
 *   <li>{@code STEP}, one per completed step in the order run: {@code index} (0 first, counting every pass)
 *       {@code pass} (0 first) {@code phase=coarse|locate|refine frequencyHz driveAmplitudeV rigTimeS}
 *       {@code settle=settled|timed_out|fixed_dwell settleS} and, when the level control could not reach its
 *       target, {@code warning}; then for {@code force} and {@code response} the whole sine fit:
 *       {@code .frequencyHz .amplitude .phaseRad .offset .harmonics} (comma-separated peak amplitudes of
 *       harmonics 2, 3, ..., or {@code none}) {@code .residualRms .amplitudeStd .phaseStdRad .sampleCount};
 *       then, derived from those for reading by eye, {@code frf.re frf.im relativeResidual
 *       relativeStdError}; and when samples are kept {@code samples.offset samples.count samples.crc}.</li>
 *   <li>{@code END status=completed|cancelled|limit|fault at completedSteps reason}: how a session ended,
 *       written once the output is off. A journal cut off by a power loss or a kill has none.</li>
 *   <li>{@code RESUMED at identity completedSteps}: a resume starts a new session; its steps and END follow.</li>
 * </ul>
 *
 * <h2>Samples side file</h2>
 * When the header names one ({@code samples=journal.samples}), it sits beside the journal and holds,
 * for each step, the integration samples the fits were made on: {@code samples.count} IEEE-754 doubles
 * big-endian of the force channel, then as many of the response channel, starting at byte
 * {@code samples.offset}; {@code samples.crc} is the CRC-32 of those bytes. The samples are forced to
 * disk before their STEP record is written.
 *
 * <h2>Durability and read-back</h2>
 * Every record is written and forced ({@link java.nio.channels.FileChannel#force(boolean)}) before
 * the engine commands the next step. {@link org.tautline.driver.journal.JournalReader} keeps every
 * record up to the first one that lacks its line feed or fails its CRC, and says at which byte it
 * stopped; a resume cuts the file there before appending.
 */
package org.tautline.driver.journal;
