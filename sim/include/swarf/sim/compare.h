#pragma once
// The as-cut part against the drawing: signed deviation normal to each nominal feature
// (+ metal left on, − overcut), the diameter as cut at the gauge plane, the fitted half angle,
// and a verdict per feature against its tolerance.
//
// A diameter tolerance ±t on a surface at half angle θ is a band of ±(t/2)·cos θ normal to it.
// Internal corners (a feature's end against a larger neighbour or a face) keep the nose radius
// as any turned corner does: samples within one nose radius of such a corner are shown in the
// deviation but left out of the feature's verdict and its largest left-on.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <vector>

namespace swarf {

/// Index of the radial feature (cylinder, cone, chamfer) that gives the nominal radius at z
/// (the larger where two meet), or −1.
int featureAt(const Part& part, double zMm);

/// The drawing's radius on the grid's samples; NaN where the drawing gives none.
Profile nominalOnGrid(const Part& part, const Profile& grid);

/// Signed deviation normal to the nominal surface per sample, mm: (R − Rn)·cos θ of the feature
/// at that sample; NaN off the drawing.
std::vector<double> normalDeviation(const Part& part, const Profile& nominal, const Profile& asCut);

/// The drawing's radius on one side on the grid's samples (inside: the drawn bore, from
/// Part::radialFeatureOnSide); NaN where the drawing gives none on that side.
Profile nominalOnGrid(const Part& part, const Profile& grid, Side side);

/// Signed deviation normal to the drawing on one side per sample, mm: + metal left on, − overcut.
/// Outside it is normalDeviation; inside, metal left on is metal within the drawn bore (the
/// as-cut bore smaller than drawn: a plug gauge goes in short), so (Rn − R)·cos θ. NaN off the
/// drawing on that side.
std::vector<double> normalDeviation(const Part& part, const Profile& nominal, const Profile& asCut,
                                    Side side);

/// Signed deviation normal to the drawing of a surface point at (z, radius), mm: + left on,
/// − overcut; NaN off the drawing. For colouring the 3D surface (FeedMarkSurface) point by point.
double normalDeviationAt(const Part& part, double zMm, double radiusMm);

/// Half-width of a feature's tolerance band normal to its surface, mm: (t/2)·cos θ (for a face
/// the axial ±t).
double normalBandMm(const Feature& feature);

/// A sharp internal corner of the drawing: radial feature `feature` ends at zMm (its start or its
/// end) against a neighbour that stands taller there, so the drawing has a wall square to the
/// axis. interiorAngleRad is the angle between the feature's surface and the wall, inside the
/// metal's outline: 90° + θ if the feature rises toward the wall, 90° − θ if it falls.
struct InternalCorner {
    int feature = -1;
    double zMm = 0;
    double radiusMm = 0; ///< the feature's drawn radius at the corner
    double interiorAngleRad = 0;
    bool atFeatureEnd = true; ///< the corner is at the feature's end (else its start)
};

/// The drawing's internal corners, in the order of the features.
std::vector<InternalCorner> internalCorners(const Part& part);

/// True where sample i of the grid counts toward its feature's verdict (not within one nose
/// radius of an internal corner).
std::vector<bool> verdictMask(const Part& part, const Profile& grid, double noseRadiusMm);

/// Per-feature reports: largest left-on (from the crests' deviation `crestDeviationMm`, what a
/// gauge or micrometer touches; the valleys' `deviationMm` if it is empty) and largest overcut
/// (from the valleys), diameter as cut (cylinder: mean; cone: at the gauge plane, both of the
/// swept envelope), fitted half angle (least squares over the counted samples) and verdict.
/// `side`: the features of that side only, against `asCut` of that side (inside: the as-cut
/// bore, with the inside deviations; an inside face is reported within tolerance).
std::vector<FeatureReport> compareFeatures(const Scene& scene, const Profile& asCut,
                                           const std::vector<double>& deviationMm,
                                           const std::vector<double>& crestDeviationMm,
                                           const std::vector<bool>& mask,
                                           Side side = Side::Outside);

/// The largest metal left on and the largest overcut among signed deviations (NaN skipped).
struct DeviationExtremes {
    double leftOnMm = 0;  ///< largest + deviation, ≥ 0
    double overcutMm = 0; ///< largest − deviation as a positive number, ≥ 0
};
DeviationExtremes deviationExtremes(const std::vector<double>& deviationMm);

/// The same over the samples the verdict counts (mask from verdictMask, same length).
DeviationExtremes deviationExtremes(const std::vector<double>& deviationMm,
                                    const std::vector<bool>& mask);

/// The marked surface's deviation per sample for colouring: the crests' where they stand further
/// out than the valleys sink in, else the valleys'. Both vectors per sample, NaN off the drawing.
std::vector<double> markedDeviation(const std::vector<double>& valleysMm,
                                    const std::vector<double>& crestsMm);

/// Volume of metal left on outside the drawing, mm³: ∫ π (R² − Rn²) where R > Rn.
double leftoverVolumeMm3(const Profile& nominal, const Profile& asCut);

/// Volume of the drawing's metal cut away, mm³: ∫ π (Rn² − R²) where R < Rn.
double overcutVolumeMm3(const Profile& nominal, const Profile& asCut);

} // namespace swarf
