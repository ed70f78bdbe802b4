#pragma once
// The 3D as-cut surface with feed marks, R(z, φ), held as one fine profile per move.
//
// A straight move at constant feed f leaves a screw surface: at angle φ of revolution k the nose
// sits at path length s = f·(k + φ/2π), so turning the part by Δφ and moving f·Δφ/2π along the
// move maps its marks onto themselves. For one move and one plane z the tool's lowest x over the
// path is convex in s with its minimum at s*(z), where the outline's support point for the move's
// slope sits over z; the lowest discrete position is one of the two that bracket s*. Away from
// the move's ends that is the move's continuous envelope (the exact profile, sweep.h) plus G(ψ),
// a function of the phase ψ = frac((s* − f·φ/2π)/f) alone: the move's one profile, tabulated
// over one feed (1024 samples). Near the ends the two bracketing positions are evaluated.
//
// R(z, φ) = min(stock, the moves that can reach the final surface at z). Which moves those are
// is worked out once per sample of the exact profile: a move counts where its envelope comes
// within the crest of the final move's marks of the final surface. Nothing two-dimensional is
// stored: a picture or an STL asks for a grid over the region it shows, at its own resolution.
#include "swarf/sim/scene.h"
#include "swarf/sim/tool_outline.h"

#include <cstddef>
#include <memory>
#include <vector>

namespace swarf {

struct ToolMove;
struct ExactSweep;

/// Samples of each move's profile over one feed (a power of two, so its phase wraps cheaply).
inline constexpr int kFeedMarkProfileSamples = 1024;

/// A grid of the surface filled on demand: radiusMm[i·nPhi + j] is R at z = zMm[i] and
/// φ = phiRad[j] (φ from the operator's side, +x, toward the top). mm, radians.
struct SurfaceGrid {
    int nz = 0;                  ///< rows
    int nPhi = 0;                ///< columns
    std::vector<double> zMm;     ///< z of each row, increasing
    std::vector<double> phiRad;  ///< φ of each column, increasing, within one turn
    std::vector<float> radiusMm; ///< nz·nPhi radii, row by row
    /// R at row i, column j, mm.
    float at(int i, int j) const { return radiusMm[static_cast<std::size_t>(i) * nPhi + j]; }
    /// z of row i, mm.
    double rowZ(int i) const { return zMm[static_cast<std::size_t>(i)]; }
};

/// `n` columns evenly round a whole turn from φ = phi0Rad (φ = phi0 + 2π j / n), rad.
std::vector<double> evenColumns(int n, double phi0Rad = 0);

/// The as-cut surface with its feed marks. Immutable; copies share the same data. Built by the
/// kernel (simulate) from the moves and the exact sweep; an empty one has no marks (radiusAt is
/// NaN everywhere).
class FeedMarkSurface {
  public:
    FeedMarkSurface();

    /// Builds the surface of moves [0, sweep.cuts.size()) over the sweep's samples. `scene` gives
    /// the stock, the tip height and sim.angle_samples (the φ sampling used where moves overlap).
    static FeedMarkSurface build(const Scene& scene, const ToolOutline& outline,
                                 const std::vector<ToolMove>& moves, const ExactSweep& sweep);

    /// True if there is no surface (nothing simulated).
    bool empty() const;
    /// The extent the surface covers, mm: the exact profile's samples (past them, the bar).
    double zFromMm() const;
    double zToMm() const;
    /// sim.angle_samples of the scene it was built for.
    int angleSamples() const;
    /// Number of moves that leave feed marks (a feed and axial motion).
    std::size_t markedMoveCount() const;

    /// R(z, φ), mm: the stock, less every move that reaches the final surface there, each at its
    /// discrete tool positions (exact). 0 before the bar's free end; the bar past the samples.
    double radiusAt(double zMm, double phiRad) const;
    /// The highest R over φ at z, mm: the crests of the marks (a ring gauge's radius there).
    double crestRadiusAt(double zMm) const;
    /// The crests' radius at every sample of the exact profile (same z0, dz), mm.
    const std::vector<double>& crestRadiusOnSamples() const;
    /// The move (index into the kernel's moves) that leaves the final envelope at z; −1: stock.
    int finalMoveAt(double zMm) const;
    /// The radius move `move` alone would leave at z without marks (its swept envelope), mm;
    /// +inf where it does not reach.
    double envelopeRadiusAt(int move, double zMm) const;
    /// The axial pitch of move `move`'s marks, f·|cos α| (α the move's angle from the axis), mm;
    /// 0 for a move that leaves none.
    double markPitchZMm(int move) const;

    /// Fills out[j] with R(z, φ_j) for the n columns, φ_j = 2π·phase[j] with each phase in [0, 1).
    /// A lookup into each move's profile where it is periodic (linear between its 1024 samples:
    /// within 0.2 % of the crest height), exact elsewhere. out as float, mm.
    void fillRow(double zMm, const double* phase, int n, float* out) const;
    /// A grid over the given rows (z increasing) and columns (rad): by fillGrid where the columns
    /// are evenly spaced round a whole turn (evenColumns), else row by row with fillRow.
    SurfaceGrid grid(const std::vector<double>& rowsZMm, const std::vector<double>& phiRad) const;
    /// The grid over `rowsZMm` and evenColumns(columns, phi0Rad) into out (rows × columns
    /// floats, row by row). Each marked move's profile is first resampled at the columns' phase
    /// spacing (exactly, at least 2048 points a feed), so that every row is a contiguous
    /// interpolation between two of its resamplings: as close as fillRow, several times faster.
    void fillGrid(const std::vector<double>& rowsZMm, int columns, double phi0Rad,
                  float* out) const;
    /// Rows over [zFromMm, zToMm] that resolve the marks: where one marked move leaves the
    /// surface, every 0.004·pitch (a row within 0.2 % of a feed of each crest); elsewhere the
    /// exact profile's samples. If that would be more than maxRows (≥ 2), maxRows rows evenly
    /// spaced instead. Increasing; both ends included.
    std::vector<double> markRows(double zFromMm, double zToMm,
                                 std::size_t maxRows = 1'000'000) const;

    /// The machinery, private to the kernel's source files.
    struct Data;

  private:
    explicit FeedMarkSurface(std::shared_ptr<const Data> d);
    std::shared_ptr<const Data> d_;
};

} // namespace swarf
