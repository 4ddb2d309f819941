package org.tautline.app.qualify;

import org.tautline.analysis.specimen.EndCondition;

/**
 * What the technician states about a specimen before testing it: the nominal setup.
 *
 * @param id specimen identifier, for example a lot and serial number
 * @param description one line for people
 * @param lengthM vibrating length between the supports, m
 * @param nominalTensionN tension the specimen is meant to have, N
 * @param linearDensityKgPerM mass per unit length from the data sheet, kg/m
 * @param linearDensityStdKgPerM standard uncertainty of the linear density, kg/m
 * @param forcingPositionM stinger position from the left support, m
 * @param sensorPositionM response sensor position from the left support, m
 * @param ends how the ends are held
 */
public record SpecimenDescription(String id, String description, double lengthM, double nominalTensionN,
                                  double linearDensityKgPerM, double linearDensityStdKgPerM, double forcingPositionM,
                                  double sensorPositionM, EndCondition ends) {
}
