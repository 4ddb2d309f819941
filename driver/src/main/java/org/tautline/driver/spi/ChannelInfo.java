package org.tautline.driver.spi;

/**
 * One acquisition channel as the rig describes it.
 *
 * @param name short name, for example {@code force} or {@code response}
 * @param quantity physical quantity: {@code force}, {@code displacement}, {@code velocity} or {@code acceleration}
 * @param unit SI unit of the samples the acquisition returns, for example {@code N} or {@code m/s^2}
 */
public record ChannelInfo(String name, String quantity, String unit) {
}
