#pragma once
// The compound's sense: which way the tool goes as the compound's reading increases, along the
// axis (toward the chuck or the tailstock) and across it (in toward the axis or out), and what
// that means for a cone. Winding the compound moves the tool parallel to the cone only when the
// two senses match the way the cone widens: a cone widening toward the chuck needs "chuck and
// out" or "tailstock and in", one widening toward the tailstock "chuck and in" or "tailstock and
// out". Of the two, the one that feeds the tool toward its leading side (a right-hand tool:
// toward the chuck) cuts with the main edge; the other cuts with the trailing edge.
#include "swarf/sim/scene.h"

#include <optional>
#include <string>

namespace swarf {

/// Which way a pass moves the tool and which part of the insert does the cutting.
struct FeedDirection {
    int along = 0;  ///< +1 toward the chuck, −1 toward the tailstock, 0 straight across
    int across = 0; ///< +1 out (away from the axis), −1 in, 0 along the axis only
    /// What cuts: the main (leading) edge when feeding toward the tool's leading side, the
    /// trailing edge toward its trailing side, the nose and trailing edge when plunging in,
    /// the nose when backing out.
    enum class Edge { Main, Trailing, Plunge, BackingOut, None } edge = Edge::None;
};

/// The direction the tool moves in a manual pass (from its `from` to its `to` reading, without
/// backlash) and the edge that cuts; for a CNC path, its first move's.
FeedDirection passFeedDirection(const Scene& scene, const Pass& pass);

/// "toward the chuck and out, main edge cutting" and the like, for people.
std::string feedDirectionWords(const FeedDirection& d);

/// "toward the chuck and out": the compound's sense as the reading increases, in words.
std::string compoundSenseWords(const Setup& setup);

/// How a compound with this sense does on a cone, winding in (reading increasing) as it cuts.
struct CompoundFit {
    bool parallel = false;     ///< winding it moves the tool parallel to the cone's line
    bool trailingEdge = false; ///< parallel, but feeding toward the tool's trailing side
    /// What is wrong and what to change, in words; empty when the compound cuts the cone with
    /// the main edge.
    std::string message;
};

/// The compound as the scene describes it (advance, across) against a cone, for a tool.
/// `windingIn`: the passes run with the reading increasing (false: decreasing).
CompoundFit compoundFitForCone(const Setup& setup, const Tool& tool, const Cone& cone,
                               bool windingIn = true);

/// A note when the compound's angle looks as if it was read off the other scale (e.g. 87° set
/// on a scale graduated from the axis for a 3° half angle): its reading is within about half a
/// degree (or the angle tolerance, if larger) of the other scale's reading for the cone while
/// its true angle is off the cone's half angle by more than the angle tolerance.
std::optional<std::string> otherScaleNote(const Setup& setup, const Feature& cone);

} // namespace swarf
