// Set-over, taper attachment and compound: settings and practicality (references R5; limits
// common practice).
#include "swarf/sim/taper_methods.h"

#include "swarf/sim/compound_setting.h"
#include "swarf/sim/units.h"

#include <cassert>
#include <cmath>
#include <cstdio>

namespace swarf {

namespace {
std::string mm(double v) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.1f mm", v);
    return buf;
}
std::string deg(double rad) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.1f°", radToDeg(rad));
    return buf;
}
} // namespace

double tailstockSetOverMm(double halfAngleRad, double workLengthMm) {
    return workLengthMm * std::tan(halfAngleRad);
}

double tailstockSetOverFromDiametersMm(double bigDiameterMm, double smallDiameterMm,
                                       double taperLengthMm, double workLengthMm) {
    assert(taperLengthMm > 0);
    return (bigDiameterMm - smallDiameterMm) * workLengthMm / (2.0 * taperLengthMm);
}

double taperAttachmentAngleFromTaperPerFootRad(double taperPerFootIn) {
    return std::atan(taperPerFootIn / 24.0);
}

double taperAttachmentOffsetMm(double halfAngleRad, double barLengthMm) {
    return barLengthMm * std::tan(halfAngleRad);
}

std::vector<TaperMethodVerdict> judgeTaperMethods(const TaperJob& job,
                                                  const TaperMethodLimits& limits) {
    assert(job.halfAngleRad > 0 && job.halfAngleRad < kPi / 2 && job.coneLengthMm > 0);
    std::vector<TaperMethodVerdict> out;

    TaperMethodVerdict setOver{TaperMethodKind::TailstockSetOver,
                               "tailstock set-over",
                               false,
                               std::nullopt,
                               std::nullopt,
                               ""};
    if (!job.outside) {
        setOver.why = "cuts only outside cones on work between centres";
    } else if (!job.workLengthMm) {
        setOver.why = "needs the work length between centres to compute";
    } else if (*job.workLengthMm < job.coneLengthMm) {
        setOver.why = "the work between centres is shorter than the cone";
    } else {
        const double so = tailstockSetOverMm(job.halfAngleRad, *job.workLengthMm);
        setOver.settingMm = so;
        setOver.practical = so <= limits.maxSetOverMm;
        setOver.why = setOver.practical
                          ? "shallow cone on work between centres; power feed gives a good finish; "
                            "every piece must have the same length and centre-hole depth"
                          : "set-over " + mm(so) + " is more than about " +
                                mm(limits.maxSetOverMm) + ": the centres bear badly in their holes";
    }
    out.push_back(setOver);

    TaperMethodVerdict attach{TaperMethodKind::TaperAttachment,
                              "taper attachment",
                              false,
                              std::nullopt,
                              job.halfAngleRad,
                              ""};
    if (job.halfAngleRad > limits.maxAttachmentHalfAngleRad) {
        attach.why = "half angle " + deg(job.halfAngleRad) + " is beyond the guide bar's usual " +
                     deg(limits.maxAttachmentHalfAngleRad);
    } else if (job.coneLengthMm > limits.attachmentTravelMm) {
        attach.why = "cone length " + mm(job.coneLengthMm) + " is more than the guide bar's " +
                     mm(limits.attachmentTravelMm);
    } else {
        attach.practical = true;
        attach.why = "within the guide bar's angle and length; power feed, work in a chuck or "
                     "between centres, outside or bore; take up the attachment's backlash first";
    }
    out.push_back(attach);

    TaperMethodVerdict comp{
        TaperMethodKind::Compound, "compound slide", false, std::nullopt, job.halfAngleRad, ""};
    const double stroke = compoundStrokeMm(job.halfAngleRad, job.coneLengthMm);
    comp.settingMm = stroke;
    if (stroke > limits.compoundTravelMm) {
        comp.why = "stroke " + mm(stroke) + " is more than the compound's travel " +
                   mm(limits.compoundTravelMm);
    } else {
        comp.practical = true;
        comp.why = "any angle, short cones; fed by hand, so the finish depends on an even feed";
    }
    out.push_back(comp);
    return out;
}

} // namespace swarf
