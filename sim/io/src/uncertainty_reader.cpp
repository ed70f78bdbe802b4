// Reading [uncertainty]: how sure the set-up is (scenes/README.md). Every key is optional and
// defaults to exact; lengths in the scene's units, angles in degrees.
#include "scene_sections.h"
#include "swarf/io/insert_codes.h"

#include <cctype>

namespace swarf::io::detail {

namespace {

// A backlash key: "known" or "unknown".
BacklashKnowledge readBacklash(const Fields& f, std::string_view key) {
    const auto s = f.choice(key, {"known", "unknown"});
    return s && *s == "unknown" ? BacklashKnowledge::Unknown : BacklashKnowledge::Known;
}

// A reading's half-width: 0 or more, less than one turn of the slide's dial.
double readReading(const Fields& f, std::string_view key, const Slide& slide, const char* what) {
    const double e =
        f.length(key, std::string("half-width of the ") + what + " reading error").value_or(0.0);
    requirePositive(f, key, e, true);
    const double turn = slide.mmPerDivision * slide.divisionsPerTurn;
    f.require(e < turn, key,
              "expected less than one turn of the " + std::string(what) + " dial (" +
                  formatLengthNumber(turn, f.context().units) + " " + f.unit() + ")");
    return e;
}

// nose_radius_sd: a length, or "iso" for the tolerance class of the insert's designation.
void readNoseRadius(const Fields& root, const Fields& f, const Tool& tool, Uncertainty& u) {
    const toml::node* n = f.node("nose_radius_sd");
    if (!n)
        return;
    if (n->as_string()) {
        const std::string word = n->as_string()->get();
        f.require(word == "iso", "nose_radius_sd",
                  "expected a length in " + f.unit() +
                      ", or \"iso\" for the tolerance of the insert's ISO 1832 class");
        const toml::table* t = root.subtable("tool");
        const toml::node* ins = t ? t->get("insert") : nullptr;
        const auto code = ins && ins->as_string() ? parseInsertCode(ins->as_string()->get())
                                                  : std::optional<InsertCode>{};
        f.require(code.has_value(), "nose_radius_sd",
                  "expected a length: \"iso\" takes the tolerance class from the insert's "
                  "designation (tool.insert, e.g. \"DCMT 11T304\"), and this tool has none");
        const double ic =
            code->inscribedCircleMm > 0
                ? code->inscribedCircleMm
                : inscribedCircleMm(tool.shape, tool.includedAngleRad, tool.edgeLengthMm);
        const auto tol = iso1832CornerToleranceMm(code->toleranceClass, ic);
        f.require(tol.has_value(), "nose_radius_sd",
                  std::string("expected a length: the insert's tolerance class '") +
                      code->toleranceClass + "' is not one of A, C, E, F, G, H, J, K, L, M, N, U");
        u.noseRadiusToleranceMm = *tol;
        u.noseRadiusClass =
            static_cast<char>(std::toupper(static_cast<unsigned char>(code->toleranceClass)));
        return;
    }
    u.noseRadiusSdMm = *f.length("nose_radius_sd", "sd of the nose radius");
    requirePositive(f, "nose_radius_sd", u.noseRadiusSdMm, true);
    f.require(u.noseRadiusSdMm < 0.5 * tool.noseRadiusMm, "nose_radius_sd",
              "expected less than half the nose radius (" +
                  formatLengthNumber(tool.noseRadiusMm, f.context().units, Precision::Insert) +
                  " " + f.unit() + ")");
}

} // namespace

Uncertainty readUncertainty(const Fields& root, const Tool& tool, const Setup& setup) {
    Uncertainty u;
    const toml::table* t = root.subtable("uncertainty");
    if (!t)
        return u;
    Fields f(*t, "uncertainty", root.context(),
             {"compound_angle_sd", "cross_reading", "compound_reading", "saddle_reading",
              "cross_backlash", "compound_backlash", "saddle_backlash", "tip_height_sd",
              "nose_radius_sd", "measuring_sd"});
    u.where = f.where();
    u.compoundAngleSdRad =
        f.angle("compound_angle_sd", "sd of the compound's true angle").value_or(0.0);
    f.require(u.compoundAngleSdRad >= 0 && u.compoundAngleSdRad <= degToRad(5), "compound_angle_sd",
              "expected from 0 to 5 degrees");
    u.crossReadingMm = readReading(f, "cross_reading", setup.cross, "cross-slide");
    u.compoundReadingMm = readReading(f, "compound_reading", setup.compound, "compound");
    u.saddleReadingMm = readReading(f, "saddle_reading", setup.saddle, "saddle");
    u.crossBacklash = readBacklash(f, "cross_backlash");
    u.compoundBacklash = readBacklash(f, "compound_backlash");
    u.saddleBacklash = readBacklash(f, "saddle_backlash");
    u.tipHeightSdMm = f.length("tip_height_sd", "sd of the tip height").value_or(0.0);
    requirePositive(f, "tip_height_sd", u.tipHeightSdMm, true);
    f.require(u.tipHeightSdMm < 1.0, "tip_height_sd",
              "expected less than 1 mm (0.039 in): a tip set further off is set again");
    readNoseRadius(root, f, tool, u);
    u.measuringSdMm = f.length("measuring_sd", "sd of the measurement").value_or(0.0);
    requirePositive(f, "measuring_sd", u.measuringSdMm, true);
    f.require(u.measuringSdMm < 1.0, "measuring_sd", "expected less than 1 mm (0.039 in)");
    return u;
}

} // namespace swarf::io::detail
