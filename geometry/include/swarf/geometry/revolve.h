#pragma once
// Solids of revolution about the spindle axis: the stock, the drawing's part and the as-cut
// part. Frame and units: see solid.h (Z = spindle axis = our z, X = our x, millimetres).
#include "swarf/geometry/solid.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <vector>

namespace swarf::geometry {

/// The stock as it sticks out of the chuck: a cylinder of the bar's diameter from its free end
/// (z = −faceAllowanceMm) to the jaws' face (z = jawZMm()). The bar inside the jaws is left out.
/// Throws GeometryError if the modeller fails.
Solid stockSolid(const Stock& stock);

/// The part as the drawing gives it: the features' outlines (cylinders, cones, chamfers; faces
/// are the steps between them) revolved about the axis, from the first feature's start to the
/// last feature's end. Where two features leave a gap the outline bridges it with a straight
/// line (the drawing says nothing there). Throws GeometryError if there is no feature with a
/// length or if the modeller fails.
Solid nominalSolid(const Part& part);

/// The nominal outline as (z, x) points, mm, from the datum side to the chuck side, before it
/// is closed to the axis. Consecutive points differ; equal z means a face (a step).
std::vector<std::pair<double, double>> nominalOutline(const Part& part);

/// How a sampled profile is turned into curves.
struct ProfileFitOptions {
    /// Samples within this distance (mm) of a chord or a circle are taken as on it. Kept tiny:
    /// a chord's error is all on one side and adds up in the volume (a 0.1 µm bias over a
    /// 30 mm bar is 1.3e-5 of its volume), and the kernel's lines and arcs are exact to
    /// rounding, so they still come out as single segments and arcs.
    double lineToleranceMm = 1e-6;
    /// Tolerance asked of the B-spline approximation, mm (its error is not one-sided).
    double splineToleranceMm = 1e-4;
    /// Largest allowed distance (mm) of any sample from the fitted curves: a B-spline piece
    /// farther than this from any of its samples is split in two and refitted.
    double maxFitErrorMm = 5e-4;
    /// A chord is a straight segment of the result if it spans at least this many intervals;
    /// shorter chords in a row form a curved stretch fitted by an arc or B-splines.
    int minLineIntervals = 8;
};

/// A profile turned into a solid, with what the fit did.
struct FittedSolid {
    Solid solid;
    double maxFitErrorMm = 0; ///< largest distance of any sample from the fitted outline, mm
    int lineCount = 0;        ///< straight segments fitted (closing and extending ones excluded)
    int arcCount = 0;         ///< circular arcs
    int splineCount = 0;      ///< B-spline pieces
    int sampleCount = 0;      ///< samples fitted
};

/// The solid of revolution of a sampled profile (the kernel's as-cut profile): the radii at the
/// samples are joined by straight segments where they lie on a line within
/// `lineToleranceMm`, by circular arcs where they lie on a circle (a nose arc) within it, and
/// elsewhere by B-splines fitted so that every sample lies within `maxFitErrorMm` of the
/// outline (the largest distance is measured at every sample and returned). The outline is
/// closed by the end faces and the axis. Where the profile's radius is 0 (the cut went through
/// the centre) the part has come apart: the result is then one solid per stretch of material
/// (solidCount() > 1). Preconditions: at least 2 samples, dzMm > 0. Throws GeometryError if a
/// radius is negative or not a number, if every radius is 0, or if the modeller fails or makes
/// an invalid solid.
FittedSolid profileSolid(const Profile& profile, const ProfileFitOptions& options = {});

/// The as-cut part over the stock's whole stick-out: profileSolid() of the kernel's profile
/// and, from the profile's last sample to the jaws' face, the bar as it was (the kernel samples
/// only as far as the tool reaches, plus 1 mm). Throws GeometryError as profileSolid().
FittedSolid asCutSolid(const Stock& stock, const Profile& asCut,
                       const ProfileFitOptions& options = {});

/// The solid of revolution of an outline of straight segments through (z, x) points (mm),
/// closed by straight lines to the axis at both ends. Throws GeometryError as profileSolid.
Solid polylineSolid(const std::vector<std::pair<double, double>>& zxPoints);

} // namespace swarf::geometry
