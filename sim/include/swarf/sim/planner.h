#pragma once
// Planning a cone for a manual lathe: from the drawing's main cone, the bar, the insert and the
// lathe, the passes in handwheel numbers (roughing parallel to the cone with the compound, or
// stepped saddle passes first, then a finishing pass with the nose-radius offset), the
// references to work from, the checks before the finishing pass and the expected roughness.
// Pure functions on values; all lengths mm, angles radians. The planned scene goes through the
// same kernel as any other scene, so a plan can be proved by simulate().
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf {

/// A reading as a person sets it on a dial that wraps: whole turns from zero, then a division.
struct DialSetting {
    long turns = 0;      ///< whole turns from the zero reading (negative: that many turns back)
    double division = 0; ///< the division the dial shows, 0 ≤ division < divisionsPerTurn
};

/// Splits a reading (mm of dial) into turns and the division shown. Example: 0.02 mm per
/// division, 100 divisions: 2.53 mm → 1 turn, division 26.5; −0.5 mm → turn −1, division 75.
DialSetting dialSetting(const Slide& slide, double readingMm);

/// The reading (mm of dial) rounded to the nearest 1/stepsPerDivision of a division.
double roundToDivision(const Slide& slide, double readingMm, int stepsPerDivision = 1);

/// How fast to turn the handwheel of a pass's moving slide, by hand, for its feed at the
/// scene's spindle speed: feed × rev/min ÷ travel per turn, turns a minute; 0 without a spindle
/// speed or for a CNC path.
double handwheelTurnsPerMinute(const Setup& setup, const Pass& pass);

/// One step of the order of operations, in words (lengths in the scene's units).
struct PlanStep {
    enum class Kind {
        Face,         ///< face the end to length: the datum face
        CentreHeight, ///< set the tool's tip on centre height
        SetCompound,  ///< swing and set the compound
        TouchOff,     ///< touch the tool on a surface and zero dials
        Pass,         ///< one pass of the plan (see `pass`)
        Measure,      ///< measure something, compare with the expected value
        Note,         ///< anything else the person must know at this point
    } kind = Kind::Note;
    std::string text; ///< what to do
    int pass = -1;    ///< Pass: index into the planned scene's plan.passes
};

/// How a pass's readings are shown: before the references are made the person works from a
/// touch-off on the bar and its end; after, from the references. The planned scene holds one
/// zero (the references'); shown reading = scene reading + the stage's offset.
struct PassDisplay {
    int stage = 1;           ///< 0: from the first touch-off; 1: from the references
    bool coneFinish = false; ///< the cone's finishing pass
    bool coneRough = false;  ///< a roughing pass of the cone (compound or saddle steps)
    int setting = 0;         ///< compound passes: which saddle setting (0, 1, ...)
};

/// The reading over two equal rolls at two heights, to check the cone's angle and size.
struct RollCheck {
    double rollDiameterMm = 0;
    double height1Mm = 0, height2Mm = 0; ///< roll-centre planes from the small end face, mm
    double z1Mm = 0, z2Mm = 0;           ///< the same planes as part z
    double reading1Mm = 0,
           reading2Mm = 0;   ///< expected micrometer readings over the rolls, finished
    double roughExtraMm = 0; ///< what both readings exceed these by before finishing
};

/// The sine bar stack that sets the compound at its angle.
struct SineBarCheck {
    double barLengthMm = 0; ///< centre distance of the sine bar's rolls
    double angleRad = 0;    ///< the angle the bar is set to
    double stackMm = 0;     ///< gauge stack height H = L sin(angle)
    /// Blocks from the scene's set under the raised roll (empty if the set cannot make it).
    std::vector<double> blocksMm;
    /// Blocks under the other roll when the stack alone is too short to build from the set (the
    /// raised roll then stands on blocksMm, stackMm higher); empty when it sits on the plate.
    std::vector<double> baseBlocksMm;
};

/// The checks of a bored cone (a socket): a plug gauge's stand-off and the mouth's diameter.
struct BoreChecks {
    /// A plug gauge (of the drawing's cone) can go in: the bore widens toward the free end.
    bool plugGauge = false;
    double gaugeLineZMm = 0;    ///< where the plug's gauge line sits on a finished bore (z)
    double bandMm = 0;          ///< ± along the axis the gauge line may stand: tol / (2 tan θ)
    double roughStandOutMm = 0; ///< before finishing, the gauge line stands this much further out
    double mouthZMm = 0;        ///< plane of the inside-micrometer check, just inside the mouth
    double mouthDiameterFinishedMm = 0, mouthDiameterRoughMm = 0;
    double pilotDiameterMm = 0; ///< the bore opened with saddle passes before the cone
};

/// The result of planning: either a planned scene or the reasons there is none.
struct ConePlan {
    bool planned = false;                 ///< false: no passes (see problems, suggestions)
    Scene scene;                          ///< the input scene with set-up and passes planned
    std::vector<std::string> problems;    ///< why nothing was planned
    std::vector<std::string> suggestions; ///< inserts/holders that could follow the cone
    std::vector<std::string> cautions;    ///< things the person must know (travel, corners)
    std::vector<PlanStep> steps;          ///< the order of operations
    std::vector<PassDisplay> display;     ///< one per pass of scene.plan
    double stage0CrossOffsetMm = 0;       ///< add to a stage-0 cross reading (mm of dial)
    double stage0SaddleOffsetMm = 0;      ///< add to a stage-0 saddle reading

    int featureIndex = -1;              ///< the cone planned (index into part.features)
    double halfAngleRad = 0;            ///< the cone's half angle θ
    double compoundReadingRad = 0;      ///< what to set on the compound's scale
    double noseOffsetRadialMm = 0;      ///< finishing path below the cone line, radius (signed)
    double noseOffsetAxialMm = 0;       ///< the same shift expressed along the axis (R1 ΔZ)
    double noseNormalErrorMm = 0;       ///< metal a tip-placed path would leave, normal to cone
    int roughingPasses = 0;             ///< cone roughing passes (compound), per setting
    int saddleStepPasses = 0;           ///< stepped saddle roughing passes
    int compoundSettings = 1;           ///< saddle settings the compound's travel needs
    double compoundRunMm = 0;           ///< compound travel one finishing pass needs in all
    double referenceZMm = 0;            ///< plane of the reference diameter
    double referenceDiameterMm = 0;     ///< reference diameter (finished cylinder or gauge)
    double checkZMm = 0;                ///< plane where the diameter is checked
    double checkDiameterRoughMm = 0;    ///< its diameter before the finishing pass
    double checkDiameterFinishedMm = 0; ///< its diameter when finished
    RollCheck rolls;
    SineBarCheck sineBar;
    double rtMm = 0, raMm = 0; ///< theoretical roughness of the finishing pass

    /// The compound winds toward the tool's trailing side: the trailing edge cuts (said in
    /// cautions, with what to change).
    bool trailingEdge = false;
    /// Setting the compound with an indicator on a test bar parallel to the axis: over this
    /// much compound travel the indicator moves indicatorMoveMm = L·sin θ (references R10).
    double indicatorTravelMm = 0, indicatorMoveMm = 0;
    /// The cone's finishing pass nearest the check plane: its cross-slide reading and the z
    /// where its compound reads 0 (the cut pivots there if the compound's angle is off).
    int finishPass = -1;
    double finishCrossMm = 0, finishPivotZMm = 0;
    /// Passes whose finishing reading had to be set on half a division (no whole division keeps
    /// the tolerance); empty when every reading is a whole division.
    std::vector<int> halfDivisionPasses;
    /// The plan has a measured trial cut before finishing (PlanningOptions::trialCut).
    bool trialCut = false;
    /// An inside cone, bored with a boring bar (planInsideCone); its checks are `bore`, not the
    /// rolls. The nose offset is then outward, toward the wall (noseOffsetRadialMm > 0).
    bool inside = false;
    BoreChecks bore;
    /// How the plan was chosen from the scene's uncertainty (plan_choice.h), in lines for
    /// people: the target, each way of working tried with its chance; empty when not chosen.
    std::vector<std::string> choiceLines;
    /// The steps that matter most to the chance of a good part, largest first (plan_choice.h);
    /// empty when not chosen.
    std::vector<std::string> stepsThatMatter;
};

/// Least angle (rad) kept between the path and the insert's trailing or leading edge: a
/// clearance of a few degrees (references R8 give 2–7°).
inline constexpr double kEdgeClearanceRad = 0.0872664626; // 5°

/// Plans the drawing's main cone (Part::mainCone) on the scene's lathe with its tool, following
/// scene.planning. The scene's own plan is ignored. Never throws for a cone the tool cannot
/// follow: it returns planned == false with the reasons and suggestions. Precondition: the
/// scene is validated.
ConePlan planCone(const Scene& scene);

/// Plans the drawing's main inside cone (Part::mainInsideCone) with the scene's boring bar: a
/// pilot bore with saddle passes, then compound passes (roughing, then finishing with the inside
/// nose-radius offset, outward toward the wall), with the checks of a socket (BoreChecks).
/// planCone calls it for a scene whose tool is a boring bar. Same contract as planCone.
ConePlan planInsideCone(const Scene& scene);

/// Whether a tool can follow a straight path at angle pathAngleRad from +z (positive climbs
/// outward toward the chuck) without its trailing or leading edge cutting behind the nose,
/// keeping clearanceRad. Hand R leads toward +z, L toward −z (N is taken as R).
bool toolFollowsSlope(const Tool& tool, double pathAngleRad,
                      double clearanceRad = kEdgeClearanceRad);

/// Insert shapes and holder styles (ISO 1832 / ISO 5608 letters, references R8) that can follow
/// a path at pathAngleRad, in words, most usual first; at most `count`.
std::vector<std::string> suggestTools(const Tool& tool, double pathAngleRad, int count = 4);

} // namespace swarf
