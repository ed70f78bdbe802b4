#pragma once
// Other ways to cut the same cone on a manual lathe (references R5): the tailstock set over for
// work between centres, a taper attachment, or the compound slide; and a judgement of which
// are practical for a given cone. The limits are common practice, not published values; each
// can be changed.
#include <optional>
#include <string>
#include <vector>

namespace swarf {

/// Tailstock set-over (mm) that turns a cone of half angle θ (rad) along work of total length
/// workLengthMm (mm) held between centres: L_work · tan θ. Equal to the published form
/// (D − d) L_work / (2 L_taper).
double tailstockSetOverMm(double halfAngleRad, double workLengthMm);

/// The published form of the same (references R5): (D − d) · L_work / (2 · L_taper), mm.
/// All lengths mm, taperLengthMm > 0.
double tailstockSetOverFromDiametersMm(double bigDiameterMm, double smallDiameterMm,
                                       double taperLengthMm, double workLengthMm);

/// Angle (rad) to set a taper attachment's guide bar to, from the axis: the half angle θ.
/// From a taper per foot on diameter (in/ft): tan θ = TPF / 24 (references R5).
double taperAttachmentAngleFromTaperPerFootRad(double taperPerFootIn);

/// Sideways offset (mm) of the guide bar over a length barLengthMm (mm) along it, for
/// attachments set by an offset rather than an angle: L · tan θ.
double taperAttachmentOffsetMm(double halfAngleRad, double barLengthMm);

/// Limits used to judge the methods. Defaults are common practice for a mid-size lathe.
struct TaperMethodLimits {
    double maxSetOverMm = 10.0; ///< larger set-overs spoil the centre holes
    double maxAttachmentHalfAngleRad = 0.17453292519943295; ///< about 10°
    double attachmentTravelMm = 250.0; ///< guide bar's usable length along z, mm
    double compoundTravelMm = 100.0;   ///< compound's usable travel, mm
};

/// The three methods.
enum class TaperMethodKind { TailstockSetOver, TaperAttachment, Compound };

/// One method for one cone: its setting and whether it suits.
struct TaperMethodVerdict {
    TaperMethodKind kind = TaperMethodKind::Compound;
    std::string name;                ///< "tailstock set-over", "taper attachment", "compound slide"
    bool practical = false;          ///< fits the limits (and the work can be held for it)
    std::optional<double> settingMm; ///< set-over or compound stroke, mm (when defined)
    std::optional<double> settingRad; ///< attachment or compound angle from the axis, rad
    std::string why;                  ///< the reason in plain words
};

/// What the judgement needs to know about the job.
struct TaperJob {
    double halfAngleRad = 0;            ///< 0 < θ < π/2
    double coneLengthMm = 0;            ///< axial length of the cone, mm (> 0)
    std::optional<double> workLengthMm; ///< whole work between centres, mm (set-over only)
    bool outside = true;                ///< an outside cone (set-over cannot cut a bore)
};

/// Settings for all three methods and whether each is practical for the job, in the order
/// set-over, attachment, compound.
std::vector<TaperMethodVerdict> judgeTaperMethods(const TaperJob& job,
                                                  const TaperMethodLimits& limits = {});

} // namespace swarf
