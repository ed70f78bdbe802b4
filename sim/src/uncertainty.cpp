// The uncertainties of a set-up and the sources of an error budget (see uncertainty.h).
#include "swarf/sim/uncertainty.h"

namespace swarf {

bool Uncertainty::exact() const {
    return compoundAngleSdRad == 0 && crossReadingMm == 0 && compoundReadingMm == 0 &&
           saddleReadingMm == 0 && crossBacklash == BacklashKnowledge::Known &&
           compoundBacklash == BacklashKnowledge::Known &&
           saddleBacklash == BacklashKnowledge::Known && tipHeightSdMm == 0 &&
           noseRadiusSdMm == 0 && noseRadiusToleranceMm == 0 && measuringSdMm == 0;
}

const std::vector<BudgetSource>& allBudgetSources() {
    static const std::vector<BudgetSource> all = {
        BudgetSource::CompoundAngle,  BudgetSource::CrossReading,  BudgetSource::CompoundReading,
        BudgetSource::SaddleReading,  BudgetSource::CrossBacklash, BudgetSource::CompoundBacklash,
        BudgetSource::SaddleBacklash, BudgetSource::TipHeight,     BudgetSource::NoseRadius,
        BudgetSource::Measuring};
    return all;
}

const char* budgetSourceKey(BudgetSource source) {
    switch (source) {
    case BudgetSource::CompoundAngle:
        return "compound_angle";
    case BudgetSource::CrossReading:
        return "cross_reading";
    case BudgetSource::CompoundReading:
        return "compound_reading";
    case BudgetSource::SaddleReading:
        return "saddle_reading";
    case BudgetSource::CrossBacklash:
        return "cross_backlash";
    case BudgetSource::CompoundBacklash:
        return "compound_backlash";
    case BudgetSource::SaddleBacklash:
        return "saddle_backlash";
    case BudgetSource::TipHeight:
        return "tip_height";
    case BudgetSource::NoseRadius:
        return "nose_radius";
    case BudgetSource::Measuring:
        return "measuring";
    }
    return "?";
}

const char* budgetSourceName(BudgetSource source) {
    switch (source) {
    case BudgetSource::CompoundAngle:
        return "the compound setting";
    case BudgetSource::CrossReading:
        return "the cross-slide reading";
    case BudgetSource::CompoundReading:
        return "the compound reading";
    case BudgetSource::SaddleReading:
        return "the saddle reading";
    case BudgetSource::CrossBacklash:
        return "the cross-slide's backlash";
    case BudgetSource::CompoundBacklash:
        return "the compound's backlash";
    case BudgetSource::SaddleBacklash:
        return "the saddle's backlash";
    case BudgetSource::TipHeight:
        return "the tip height";
    case BudgetSource::NoseRadius:
        return "the nose radius";
    case BudgetSource::Measuring:
        return "the measurement the dials are zeroed on";
    }
    return "?";
}

const char* budgetSourceAdvice(BudgetSource source) {
    switch (source) {
    case BudgetSource::CompoundAngle:
        return "set it with the sine bar";
    case BudgetSource::CrossReading:
        return "take a measured trial cut before finishing and correct the reading from it";
    case BudgetSource::CompoundReading:
        return "read the compound's dial at the start and end of each pass with care";
    case BudgetSource::SaddleReading:
        return "set the saddle against a stop or with a dial indicator";
    case BudgetSource::CrossBacklash:
    case BudgetSource::CompoundBacklash:
    case BudgetSource::SaddleBacklash:
        return "take it up: come to every reading from the same side";
    case BudgetSource::TipHeight:
        return "set the tip on centre with a height gauge";
    case BudgetSource::NoseRadius:
        return "measure the insert's nose radius, or use an insert of a closer tolerance class";
    case BudgetSource::Measuring:
        return "measure the diameter the dials are zeroed on with a finer instrument";
    }
    return "";
}

std::vector<BudgetSource> activeBudgetSources(const Uncertainty& u, double crossBacklashMm,
                                              double compoundBacklashMm, double saddleBacklashMm) {
    std::vector<BudgetSource> out;
    for (BudgetSource s : allBudgetSources()) {
        bool on = false;
        switch (s) {
        case BudgetSource::CompoundAngle:
            on = u.compoundAngleSdRad > 0;
            break;
        case BudgetSource::CrossReading:
            on = u.crossReadingMm > 0;
            break;
        case BudgetSource::CompoundReading:
            on = u.compoundReadingMm > 0;
            break;
        case BudgetSource::SaddleReading:
            on = u.saddleReadingMm > 0;
            break;
        case BudgetSource::CrossBacklash:
            on = u.crossBacklash == BacklashKnowledge::Unknown && crossBacklashMm > 0;
            break;
        case BudgetSource::CompoundBacklash:
            on = u.compoundBacklash == BacklashKnowledge::Unknown && compoundBacklashMm > 0;
            break;
        case BudgetSource::SaddleBacklash:
            on = u.saddleBacklash == BacklashKnowledge::Unknown && saddleBacklashMm > 0;
            break;
        case BudgetSource::TipHeight:
            on = u.tipHeightSdMm > 0;
            break;
        case BudgetSource::NoseRadius:
            on = u.noseRadiusSdMm > 0 || u.noseRadiusToleranceMm > 0;
            break;
        case BudgetSource::Measuring:
            on = u.measuringSdMm > 0;
            break;
        }
        if (on)
            out.push_back(s);
    }
    return out;
}

} // namespace swarf
