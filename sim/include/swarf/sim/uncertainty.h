#pragma once
// How sure the set-up is: the scene's [uncertainty] table (scenes/README.md), as plain values in
// mm and radians, and the sources of error an error budget (budget.h) draws from it. Every value
// defaults to zero, meaning "exact": a scene without the table has nothing to budget.
#include "swarf/sim/error.h"

#include <string>
#include <vector>

namespace swarf {

/// What is known about a slide's backlash.
enum class BacklashKnowledge {
    Known,   ///< the scene's value, applied by the machine model as it stands
    Unknown, ///< somewhere from 0 to the scene's value; each reading taken up or not at random
};

/// The uncertainties of a set-up. Lengths mm, angles radians; all zero (and every backlash
/// known): exact.
struct Uncertainty {
    /// Standard deviation of the compound's true angle about its set angle, rad (normal).
    double compoundAngleSdRad = 0;
    /// Half-widths of a uniform reading error, mm of dial (the cross-slide's on diameter for a
    /// diameter dial): each reading set or read is off by up to this much either way.
    double crossReadingMm = 0, compoundReadingMm = 0, saddleReadingMm = 0;
    BacklashKnowledge crossBacklash = BacklashKnowledge::Known;
    BacklashKnowledge compoundBacklash = BacklashKnowledge::Known;
    BacklashKnowledge saddleBacklash = BacklashKnowledge::Known;
    /// Standard deviation of the tip's height about the scene's tip_height, mm (normal).
    double tipHeightSdMm = 0;
    /// Standard deviation of the insert's nose radius about its nominal, mm (normal); used when
    /// noseRadiusToleranceMm is 0.
    double noseRadiusSdMm = 0;
    /// Half-width of a uniform nose-radius error, mm: the insert's ISO 1832 tolerance class
    /// (noseRadiusClass) when the scene asks for it; 0 if not.
    double noseRadiusToleranceMm = 0;
    /// The ISO 1832 tolerance class letter noseRadiusToleranceMm came from, or 0.
    char noseRadiusClass = 0;
    /// Standard deviation of a measurement the set-up works from, mm (normal): the diameter the
    /// cross-slide dial is zeroed on (setup.cross.zero_diameter), which a person measures.
    double measuringSdMm = 0;
    SourceLoc where;

    /// True when nothing is uncertain (the default).
    bool exact() const;
};

/// The sources of error of an error budget, one per key of [uncertainty] that can spread the
/// result (the backlash of each slide is one source).
enum class BudgetSource {
    CompoundAngle,
    CrossReading,
    CompoundReading,
    SaddleReading,
    CrossBacklash,
    CompoundBacklash,
    SaddleBacklash,
    TipHeight,
    NoseRadius,
    Measuring,
};

/// Every source, in the order above.
const std::vector<BudgetSource>& allBudgetSources();

/// The source as budget.json spells it: "compound_angle", "cross_reading", ...,
/// "cross_backlash", "tip_height", "nose_radius", "measuring".
const char* budgetSourceKey(BudgetSource source);

/// The source for people: "the compound setting", "the cross-slide reading", ...
const char* budgetSourceName(BudgetSource source);

/// What a person does to make the source smaller, as the end of a sentence ("set it with the
/// sine bar").
const char* budgetSourceAdvice(BudgetSource source);

/// The sources the uncertainty makes active (non-zero, or a backlash unknown with a backlash
/// to be unsure of: the scene's `backlashMm` of that slide, passed in the order cross,
/// compound, saddle), in the order of allBudgetSources().
std::vector<BudgetSource> activeBudgetSources(const Uncertainty& u, double crossBacklashMm,
                                              double compoundBacklashMm, double saddleBacklashMm);

} // namespace swarf
