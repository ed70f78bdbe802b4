#pragma once
// ISO 1832 insert shape letters and designations, and ISO 5608 holder letters (references R8).
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace swarf::io {

/// Included (corner) angle ε in degrees of an ISO 1832 shape letter swarf can model: C 80, D 55,
/// E 75, K 55, S 90, T 60, V 35, W 80; R (round) gives 180 (no corner). Empty for any other
/// letter.
std::optional<double> shapeIncludedAngleDeg(char letter);

/// Entering angle κr in degrees of an ISO 5608 holder style letter (A 90, B 75, D 45, E 60,
/// F 90, G 90, J 93, K 75, L 95, N 63, S 45, T 60, Y 85, H and Q 107.5, P 117.5, V 72.5).
/// Empty for any other letter.
std::optional<double> holderEnteringAngleDeg(char letter);

/// What an ISO 1832 metric insert designation ("DCMT 11T304", "CNMG120408") says.
struct InsertCode {
    char shape = 0;          ///< shape letter (first character)
    char toleranceClass = 0; ///< tolerance class letter (third character: "DCMT" → 'M')
    /// The cutting edge length, mm: worked out from the inscribed circle and the shape (11.6 mm
    /// for "DCMT 11T304"); for a parallelogram (K), whose edge the circle does not fix, the
    /// size code's whole millimetres.
    double edgeLengthMm = 0;
    double inscribedCircleMm = 0; ///< the inscribed circle the size code stands for; 0 for K
    double thicknessMm = 0;       ///< from the thickness code (02, T2, 03, T3, 04, 05, 06, 07, 09)
    double noseRadiusMm = 0; ///< from the corner radius code (04 → 0.4 mm; 00 sharp; M0 round)
};

/// The inscribed circles ISO 1832 inserts are made with, mm: the inch series 5/32 … 1¼ in
/// (3.97 … 31.75 mm) and the metric sizes of round inserts (6, 8, 10, 12, 16, 20, 25, 32 mm).
const std::vector<double>& standardInscribedCirclesMm();

/// The cutting edge length (mm) of an insert of shape letter `shape` whose inscribed circle is
/// icMm across (plane geometry, derived): a tangential polygon's side is ρ (cot(α/2) + cot(β/2))
/// for ρ = IC/2 and its corner angles α, β at the side's ends: rhombus C, D, E, M, V: IC / sin ε;
/// square S: IC; triangle T: IC·√3; trigon W (80° and 160° corners): ρ (cot 40° + cot 80°);
/// pentagon P: IC·tan 36°; hexagon H: IC·tan 30°; octagon O: IC·tan 22.5°; round R: the
/// diameter. Empty for a letter whose edge the circle does not fix (parallelograms A, B, K and
/// the rectangle L) or an unknown one.
std::optional<double> edgeLengthFromInscribedCircleMm(char shape, double icMm);

/// The standard inscribed circle (mm) that an ISO 1832 metric size code stands for: the one
/// whose edge length, to 0.1 mm as the standard's tables give it and then truncated to whole
/// millimetres, is the code (a triangle on a 6.35 mm circle has 10.998 mm edges, 11.0: code 11);
/// for a round insert, whose code is its diameter, a metric diameter equal to the code first.
/// Empty if none is.
std::optional<double> inscribedCircleOfSizeCodeMm(char shape, int sizeCode);

/// Parses an ISO 1832 metric designation: four letters, then size, thickness and corner radius
/// codes of two characters each, spaces ignored, anything after the radius code ignored (chip
/// breaker suffixes). Empty if it is not one.
std::optional<InsertCode> parseInsertCode(std::string_view code);

/// Half-width (mm) of the tolerance an ISO 1832 tolerance class letter gives an insert's corner
/// (its "m" dimension), taken as the tolerance of its nose radius, for an insert whose inscribed
/// circle is `inscribedCircleMm`: A, F, J 0.005; C, H, K 0.013; E, G, L 0.025; M and N 0.08 up to
/// 9.525 mm IC, 0.13 up to 12.7, 0.15 up to 19.05, 0.18 above; U 0.13, 0.2, 0.27, 0.38 over the
/// same steps (from memory: the class table as tool makers' catalogues print it; ISO 1832 gives
/// no separate nose-radius tolerance). Empty for a letter it does not know.
std::optional<double> iso1832CornerToleranceMm(char classLetter, double inscribedCircleMm);

/// Diameter of the insert's inscribed circle (mm) from its corner angle ε (rad) and cutting
/// edge length (mm): the inverse of edgeLengthFromInscribedCircleMm for the shapes it knows
/// (a rhombus or square has IC = l·sin ε, a triangle (T) l/√3, a trigon (W)
/// 2l / (cot 40° + cot 80°)); an insert given by its angle alone is taken as a rhombus; for a
/// round insert l is its diameter. Derived.
double inscribedCircleMm(char shape, double includedRad, double edgeLengthMm);

/// The largest nose radius (mm) an insert of this shape, corner angle and edge length can have:
/// the nose circle must fit inside the inscribed circle, and its tangent points must lie on the
/// edges (r / tan(ε/2) ≤ l). Derived from plane geometry.
double maxNoseRadiusMm(char shape, double includedRad, double edgeLengthMm);

} // namespace swarf::io
