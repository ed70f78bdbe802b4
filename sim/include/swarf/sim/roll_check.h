#pragma once
// Measuring a cone over two equal rolls (references R6). The cone stands on its small end on a
// surface plate; two equal rolls (pins) of diameter d lie against it on opposite sides, their
// centres in one plane square to the axis; a micrometer reads M over the rolls. Read at two
// heights, the difference of the readings gives the taper without knowing any diameter.

namespace swarf {

/// Reading over two rolls (mm) where the cone's diameter at the rolls' centre plane is
/// diameterMm (mm), for rolls of diameter rollDiameterMm (mm) and a cone of half angle θ (rad):
/// M = D + d (1 + sec θ).
double readingOverRollsMm(double diameterMm, double rollDiameterMm, double halfAngleRad);

/// The cone's diameter at the rolls' centre plane (mm) from a reading M (mm):
/// D = M − d (1 + sec θ).
double diameterFromRollReadingMm(double readingMm, double rollDiameterMm, double halfAngleRad);

/// Half angle (rad) from readings M1, M2 (mm) taken with the rolls at heights h1, h2 (mm, any
/// datum, h1 ≠ h2): tan θ = (M2 − M1) / (2 (h2 − h1)).
double halfAngleFromRollReadings(double reading1Mm, double height1Mm, double reading2Mm,
                                 double height2Mm);

/// Change of diameter (mm) over an axial length (mm) for half angle θ (rad): 2 L tan θ.
/// With lengthMm = 1 this is the rate of taper C; with 25.4 it is the change per inch.
double diameterChangeOverLengthMm(double halfAngleRad, double lengthMm);

/// Two readings over rolls for a cone standing on its small end.
struct RollReadings {
    double centreHeight1Mm = 0; ///< roll-centre plane 1 above the small end face, mm
    double centreHeight2Mm = 0; ///< roll-centre plane 2 above the small end face, mm
    double diameter1Mm = 0;     ///< cone diameter at plane 1, mm
    double diameter2Mm = 0;     ///< cone diameter at plane 2, mm
    double reading1Mm = 0;      ///< M1, mm
    double reading2Mm = 0;      ///< M2, mm
};

/// Readings over rolls of diameter d (mm) resting on equal stacks of heights stack1Mm and
/// stack2Mm (mm) on the plate the cone stands on; the roll centres are then at stack + d/2.
/// smallEndDiameterMm (mm) is the diameter at the face standing on the plate, θ in rad.
RollReadings rollReadingsForCone(double smallEndDiameterMm, double halfAngleRad,
                                 double rollDiameterMm, double stack1Mm, double stack2Mm);

/// The highest stack (mm), a whole number of `stepMm`, that keeps rolls of diameter
/// rollDiameterMm on a cone coneLengthMm long standing on its small end: the upper rolls' tops
/// stay below its large end. 0 or less when the cone is too short for two heights.
double highestRollStackMm(double coneLengthMm, double rollDiameterMm, double stepMm);

} // namespace swarf
