#pragma once
// The scene: stock, drawing, tool, set-up and plan, as plain values in mm and radians.
// Read from TOML by swarf::io::readScene (sim/io); validated by validate().
//
// Coordinates, used everywhere in swarf:
//   z  axial position, mm, measured from the part's datum face (its finished free end face)
//      toward the chuck. The stock's free end is at z = −stock.faceAllowanceMm; the jaws' face
//      is at z = −faceAllowanceMm + stickOutMm.
//   x  horizontal distance from the spindle axis, mm (the cross-slide direction), on the
//      operator's side; a point at x with the tool tip at height h off centre cuts radius
//      sqrt(x² + h²).
//   A tool position is its imaginary tip: the corner where the tangents to the nose at the
//   lowest x and at the leading z meet. Dials are zeroed on that point.
#include "swarf/sim/cone.h"
#include "swarf/sim/error.h"
#include "swarf/sim/uncertainty.h"
#include "swarf/sim/units.h"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace swarf {

/// The bar in the chuck.
struct Stock {
    double diameterMm = 0; ///< bar diameter, mm
    double lengthMm = 0;   ///< whole bar length, mm (the rest of the bar is in the jaws/spindle)
    double stickOutMm = 0; ///< from the jaws' face to the free end, mm
    double faceAllowanceMm = 0; ///< stock beyond the datum face, mm (the free end is at z = −this)
    std::string material;       ///< free text
    bool tailstockSupport = false; ///< work supported by a centre in the tailstock
    SourceLoc where;
    /// A drilled or pre-bored hole from the free end, mm; 0: solid bar. Less than diameterMm.
    double boreDiameterMm = 0;
    /// How deep the hole goes from the free end, mm (0 with no hole); it reaches the jaws' face
    /// or beyond for a hole through the work.
    double boreDepthMm = 0;
    SourceLoc boreWhere; ///< the bore_diameter key, for messages about the hole

    double freeEndZMm() const { return -faceAllowanceMm; }
    double jawZMm() const { return -faceAllowanceMm + stickOutMm; }
    /// True if the bar has a hole (boreDiameterMm > 0).
    bool hasBore() const { return boreDiameterMm > 0; }
    /// z of the bottom of the hole (mm): freeEndZMm() + boreDepthMm. Meaningful with a hole.
    double boreBottomZMm() const { return freeEndZMm() + boreDepthMm; }
    /// True if the hole reaches the jaws' face (through the work that sticks out).
    bool boreThrough() const { return hasBore() && boreBottomZMm() >= jawZMm() - 1e-9; }
};

/// ISO 2768-1 general tolerance class.
enum class Iso2768 { f, m, c, v };

/// Kinds of drawing feature along the axis.
enum class FeatureKind { Cylinder, Cone, Chamfer, Face };

/// Which surface a feature is on: the outside of the bar, or the inside of its hole (a bore).
enum class Side { Outside, Inside };

/// "outside" or "inside": a feature's side as scene files spell it (the `side` key).
const char* sideName(Side side);

/// "cylinder", "cone", "chamfer" or "face": the feature's kind as scene files and result.json
/// spell it.
const char* featureKindName(FeatureKind kind);

/// One feature of the drawing, between zStartMm and zEndMm (zStart < zEnd; equal for a face).
/// A chamfer is stored as a cone (its half angle and diameter at the face it breaks: the small
/// end outside, the large end inside). An inside feature is a surface of the bore.
struct Feature {
    FeatureKind kind = FeatureKind::Cylinder;
    Side side = Side::Outside; ///< on the outside of the bar or inside its hole
    std::string name;          ///< as the scene names it, or "feature N"
    double zStartMm = 0, zEndMm = 0;
    /// Cylinder: the diameter. Face: the outer diameter of the face. Chamfer: the diameter of
    /// the edge it breaks. Cone: its larger end diameter.
    double diameterMm = 0;
    Cone cone; ///< Cone and Chamfer
    std::string
        coneGivenAs;        ///< how the scene gave the cone ("half_angle", "standard Morse 3", ...)
    double toleranceMm = 0; ///< ± on diameter (cylinder diameter, cone gauge diameter), mm
    double angleToleranceRad = 0;        ///< ± on the half angle (cone, chamfer), rad
    bool toleranceFromClass = true;      ///< true if taken from the ISO 2768 class
    bool angleToleranceFromClass = true; ///< true if angleToleranceRad is from the ISO 2768 class
    SourceLoc where;

    /// Nominal radius at z (mm) for Cylinder, Cone, Chamfer; precondition z in [zStart, zEnd].
    double radiusAt(double zMm) const;
    /// Half angle of the surface from the axis (0 for a cylinder), rad.
    double surfaceHalfAngleRad() const;
};

/// The drawing: features along the axis from the datum face.
struct Part {
    std::vector<Feature> features; ///< in increasing z
    Iso2768 toleranceClass = Iso2768::m;
    SourceLoc where;

    /// Index of the outside radial feature (cylinder, cone, chamfer) that gives the drawn radius
    /// at z: the one covering z, the larger where two meet; −1 where none does. The one
    /// definition of "the drawing at z" that the comparison, the pictures and the planner use.
    /// Inside features are never returned (see radialFeatureOnSide).
    int radialFeatureAt(double zMm) const;
    /// As radialFeatureAt, on the given side; inside, the smaller where two meet (the bore's
    /// drawn surface is the one nearest the axis, as outside it is the one farthest from it).
    int radialFeatureOnSide(double zMm, Side side) const;
    /// True if any feature is on the inside.
    bool hasInside() const;
    /// The drawn radius at z (mm) from radialFeatureAt; empty where the drawing says nothing.
    std::optional<double> nominalRadiusAt(double zMm) const;
    /// The first outside cone feature (the one the job is about), or nullptr.
    const Feature* mainCone() const;
    /// The first inside cone feature, or nullptr.
    const Feature* mainInsideCone() const;
    double zMinMm() const;
    double zMaxMm() const;
};

/// Which way a tool is handed (ISO 1832): R feeds toward the chuck, L toward the tailstock.
enum class Hand { R, L, N };

/// What holds the insert: a turning holder (outside work) or a boring bar (inside work).
enum class ToolKind { Turning, BoringBar };

/// The insert and its holder.
struct Tool {
    ToolKind kind = ToolKind::Turning;
    char shape = 'D';            ///< ISO 1832 shape letter, or 0 when given by includedAngleRad
    double includedAngleRad = 0; ///< insert corner angle ε
    double noseRadiusMm = 0.4;   ///< r
    double enteringAngleRad = 0; ///< holder entering angle κr, measured from the feed direction
    Hand hand = Hand::R;
    double edgeLengthMm = 15; ///< cutting edge length (insert size), mm
    /// Tip above (+) or below (−) centre, mm. A boring bar's tip is on the bar's axis (its
    /// `axis_height`).
    double tipHeightMm = 0;
    double thicknessMm = 4.76; ///< insert thickness, for drawing it
    std::string holderCode;    ///< ISO 5608 holder letter if given ("J"), for messages
    double barDiameterMm = 0;  ///< BoringBar: the bar's shank diameter, mm (0 for Turning)
    double overhangMm = 0;     ///< BoringBar: from the tool post to the insert, mm
    double minBoreMm = 0;      ///< BoringBar: the smallest bore diameter the bar enters, mm
    SourceLoc where;
};

/// How the compound's angle scale is graduated.
enum class CompoundScale { FromAxis, FromCrossSlide };
/// Whether a cross-slide reading is a change of diameter or of radius.
enum class DialMode { Diameter, Radius };

/// How a slide is brought to a reading it is set to before a pass (scenes/README.md, [setup]).
enum class Approach {
    InOrder, ///< dialled straight to each reading in pass order: backlash shows on a reversal
    TakeUp,  ///< wound back past each reading and brought up to it: the slide sits at it
};

/// Which way across the axis the compound moves the tool as its reading increases.
enum class Across {
    In,  ///< toward the spindle axis
    Out, ///< away from the spindle axis
};

/// One handwheel slide.
struct Slide {
    double mmPerDivision = 0.02; ///< one dial division, mm (on diameter for a diameter dial)
    int divisionsPerTurn = 100;  ///< divisions on the dial before it wraps
    double backlashMm = 0;       ///< lost motion when the handwheel reverses, mm of slide travel
    double travelMm = 1e9;       ///< usable travel from the zero reading either way, mm
};

/// The lathe as set up. Readings of all three slides are zero when the imaginary tip is at
/// (zeroZMm, zeroDiameterMm / 2), each slide having last moved in its increasing direction.
struct Setup {
    double compoundReadingRad = 0; ///< the compound angle read on its scale
    CompoundScale compoundScale = CompoundScale::FromAxis;
    double compoundErrorRad = 0; ///< true angle from the axis minus the intended one
    /// Which way along the axis the compound moves the tool as its reading increases
    /// (TowardChuck: +z).
    Widens compoundAdvanceToward = Widens::TowardTailstock;
    /// Which way across the axis the compound moves the tool as its reading increases.
    Across compoundAdvanceAcross = Across::In;
    Slide compound{0.02, 100, 0, 100};
    Slide cross{0.02, 100, 0, 150};
    DialMode crossDial = DialMode::Diameter;
    Slide saddle{0.1, 200, 0, 1e9};
    double zeroDiameterMm = 0;             ///< diameter at which the cross-slide reads zero
    double zeroZMm = 0;                    ///< z at which the saddle reads zero
    std::optional<double> spindleRpm;      ///< for the sheet only
    Approach approach = Approach::InOrder; ///< how slides are set before each pass
    /// How far past a reading a slide is wound back before it is brought up to it (take_up),
    /// in turns of its handwheel; the travel must exceed the slide's backlash.
    double windBackTurns = 0.25;
    SourceLoc where;

    /// The compound's true angle from the spindle axis, rad (reading converted, error added).
    double compoundAxisAngleRad() const;
};

/// What a person does in one pass.
enum class PassKind {
    Compound,   ///< cross-slide and saddle locked, compound wound from → to
    Saddle,     ///< straight turning: saddle wound from → to
    CrossSlide, ///< facing or plunging: cross-slide wound from → to
    Path,       ///< CNC: straight moves through imaginary-tip points
};

/// "compound", "saddle", "cross-slide" or "path": a pass's kind for people (screens, sheets).
const char* passKindName(PassKind kind);

/// "compound", "saddle", "cross" or "path": a pass's kind as scene files and result.json spell
/// it (the `kind` key of [[plan.pass]]).
const char* passKindKey(PassKind kind);

/// One pass of the plan. Readings are in mm of dial (diameter mm for a diameter dial).
struct Pass {
    PassKind kind = PassKind::Compound;
    std::string note;            ///< what the person does, in words
    double crossMm = 0;          ///< cross-slide reading while the pass runs (if not moving)
    double compoundMm = 0;       ///< compound reading (if not moving)
    double saddleMm = 0;         ///< saddle reading (if not moving)
    double fromMm = 0, toMm = 0; ///< the moving slide's readings
    double feedMmPerRev = 0.1;
    std::vector<std::pair<double, double>> pathZX; ///< Path: (z, x radius) of the imaginary tip
    /// The cross-slide reading (mm of dial) the tool is backed out to after this pass, before it
    /// goes back to the next start; empty: one turn of the cross-slide dial out from the
    /// smaller of this pass's last and the next pass's first cross-slide reading.
    std::optional<double> retractToMm;
    /// A compound setting of this pass's own (a plan that re-sets the compound part way, e.g.
    /// after a trial cut): the angle read on the compound's scale (rad), empty: the set-up's.
    /// The scale, sense and dial stay the set-up's; the dials keep their zero.
    std::optional<double> compoundAngleRad;
    /// This pass's compound error (true angle minus intended, rad), empty: the set-up's.
    std::optional<double> compoundErrorRad;
    SourceLoc where;
};

/// The most passes a plan may hold: more is a slip (a script gone wrong, a depth of cut in the
/// wrong unit), and each pass costs the simulation a sweep of the whole surface.
inline constexpr std::size_t kMaxPasses = 200;
/// The most points a path pass may hold.
inline constexpr std::size_t kMaxPathPoints = 2000;

/// The pass plan.
struct Plan {
    std::vector<Pass> passes;
    SourceLoc where;
};

/// The least planning.max_depth a scene may ask for, mm.
inline constexpr double kMinMaxDepthMm = 0.01;

/// How the planner should plan (scene section [planning]); lengths mm.
struct PlanningOptions {
    double maxDepthMm = 1.0;        ///< largest depth of cut per roughing pass, normal to the cone
    double finishAllowanceMm = 0.1; ///< left for the finishing pass, normal to the cone
    double roughFeedMmPerRev = 0.15;
    double finishFeedMmPerRev = 0.08;
    /// How the cone is placed: zero the dials on a finished diameter and face, or turn a
    /// reference shoulder at the gauge plane to the gauge diameter and work from it.
    enum class Placing { ZeroOnDiameter, ReferenceShoulder } placing = Placing::ZeroOnDiameter;
    /// Rough with the compound parallel to the cone, or with stepped saddle passes first.
    enum class Roughing { Compound, SaddleSteps } roughing = Roughing::Compound;
    double rollDiameterMm = 0; ///< rolls for the over-rolls check; 0: choose one
    /// A measured trial cut before finishing: after the last roughing pass the diameter at the
    /// check plane is measured and the finishing reading corrected by what it is off.
    bool trialCut = false;
    bool placingStated = false;  ///< the scene gave `placing` (a choice keeps to it)
    bool trialCutStated = false; ///< the scene gave `trial_cut` (a choice keeps to it)
    /// The chance of a part within tolerance a plan must reach (0, 1): with an [uncertainty],
    /// `swarf plan` then chooses the placing and the trial cut (plan_choice.h); empty: it plans
    /// as told.
    std::optional<double> inToleranceTarget;
    SourceLoc where;
};

/// What a scene is made to show ([expect]); the scene tests check it.
struct Expect {
    std::optional<bool> withinTolerance; ///< verdict, if the scene states one
    std::vector<std::string> findings;   ///< finding kinds that must be raised ("left_on", ...)
    bool noFindings = false;             ///< true: no finding may be raised
    /// The main cause of the cone's error (a source name of causes.h), if the scene states one.
    std::string cause;
    SourceLoc where;
};

/// Options for the simulation.
struct SimOptions {
    double profileStepMm = 0.002; ///< axial sample spacing of the exact profile
    int angleSamples = 180;       ///< samples around the part for surface.stl
    SourceLoc where;              ///< the profile_step key if given, else the [sim] table or file
};

/// A whole scene.
struct Scene {
    std::string name;
    std::string description;
    std::string file; ///< the file it came from
    /// What the reader noticed that is not an error (an old name accepted, with the new one);
    /// `swarf check` prints them with the other notes.
    std::vector<std::string> readNotes;
    Units units = Units::Mm;
    Stock stock;
    Part part;
    Tool tool;
    Setup setup;
    Plan plan;
    SimOptions sim;
    PlanningOptions planning;
    Expect expect;
    Uncertainty uncertainty; ///< how sure the set-up is ([uncertainty]); exact by default
    std::vector<double>
        gaugeBlocksMm; ///< the gauge block set for sine bar stacks (empty: built-in)

    /// Checks ranges and consistency, and the size of the plan (kMaxPasses, kMaxPathPoints);
    /// throws InputError naming the key and its location.
    void validate() const;

    /// The cone this scene's tool cuts: the first inside cone for a boring bar
    /// (Part::mainInsideCone), else the first outside one (Part::mainCone); null if none.
    const Feature* workedCone() const;
};

} // namespace swarf
