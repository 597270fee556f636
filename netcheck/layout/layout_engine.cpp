#include "netcheck/layout/layout_engine.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <map>
#include <random>

#include "netcheck/layout/column_order.hpp"
#include "netcheck/layout/detail/column_merge.hpp"
#include "netcheck/layout/detail/layout_circuit.hpp"
#include "netcheck/layout/detail/strip_sweep.hpp"
#include "netcheck/layout/detail/supply_rails.hpp"
#include "netcheck/layout/supply_nets.hpp"
#include "netcheck/model/board_size.hpp"

namespace netcheck {

using layout_detail::LayoutCircuit;
using layout_detail::ShapePin;
using layout_detail::StripSweep;
using layout_detail::SweepResult;

namespace {

// One candidate: the order of the parts to place and which edge each off-board part's wires go to.
struct Arrangement {
    std::vector<int> order;
    std::vector<char> rightEdge;  // per off-board part
};

// A layout built from one arrangement, before it becomes a Board.
struct Built {
    bool ok = false;
    SweepResult copper;
    std::vector<std::vector<Hole>> partHoles;     // per part to place, per pin
    std::vector<std::vector<Hole>> offboardHoles;  // per off-board part, per lug (wired ones)
    std::vector<Cut> cuts;
    LayoutScore score;
};

// Cuts wherever two nets' copper meets along a strip: a hole cut in the middle of the unused
// holes between them, or a cut between two holes when they are next to each other.
std::vector<Cut> cutsBetweenNets(const SweepResult& copper) {
    std::vector<Cut> cuts;
    for (int row = 0; row < copper.rows; ++row) {
        int lastNet = -1;
        int lastCol = -1;
        for (int col = 0; col < copper.cols; ++col) {
            const int net = copper.owner[static_cast<std::size_t>(col)][static_cast<std::size_t>(row)];
            if (net < 0) continue;
            if (lastNet >= 0 && net != lastNet) {
                const int gap = col - lastCol - 1;
                cuts.push_back(gap == 0 ? Cut{{row, lastCol}, Cut::Kind::Between}
                                        : Cut{{row, lastCol + 1 + (gap - 1) / 2}, Cut::Kind::Hole});
            }
            lastNet = net;
            lastCol = col;
        }
    }
    return cuts;
}

std::vector<ShapePin> fixedPinsAt(const LayoutCircuit& circuit, int col, std::vector<int>& band) {
    std::vector<ShapePin> pins;
    band.clear();
    for (const auto& placed : circuit.placed) {
        if (placed.dipColumn == col) {
            for (const Pin& pin : placed.part->pins) {
                if (pin.hole.col == col) band.push_back(pin.hole.row);
            }
        }
        for (std::size_t i = 0; i < placed.part->pins.size(); ++i) {
            const Hole hole = placed.part->pins[i].hole;
            if (hole.col == col) pins.push_back({placed.nets[i], hole.row, 0});
        }
    }
    return pins;
}

// The wired lugs of off-board parts on one edge, in part order (nets that have on-board pins).
std::vector<int> lugNets(const LayoutCircuit& circuit, const Arrangement& arrangement, bool right) {
    std::vector<int> nets;
    for (std::size_t p = 0; p < circuit.offboard.size(); ++p) {
        if (static_cast<bool>(arrangement.rightEdge[p]) != right) continue;
        for (int net : circuit.offboard[p].nets) {
            if (net >= 0 && circuit.onBoard[static_cast<std::size_t>(net)]) nets.push_back(net);
        }
    }
    return nets;
}

void scatterLugHoles(const LayoutCircuit& circuit, const Arrangement& arrangement, bool right,
                     const std::vector<Hole>& holes, Built& built) {
    std::size_t next = 0;
    for (std::size_t p = 0; p < circuit.offboard.size(); ++p) {
        if (static_cast<bool>(arrangement.rightEdge[p]) != right) continue;
        for (std::size_t lug = 0; lug < circuit.offboard[p].nets.size(); ++lug) {
            const int net = circuit.offboard[p].nets[lug];
            if (net >= 0 && circuit.onBoard[static_cast<std::size_t>(net)]) {
                built.offboardHoles[p][lug] = holes[next++];
            }
        }
    }
}

// Parts stacked in shared columns where their strips allow (column_merge.hpp); placed parts and
// everything left of them stay.
void stackColumns(const LayoutCircuit& circuit, int fixedCols, Built& built) {
    std::vector<std::vector<Hole>> groups = built.partHoles;
    for (const auto& placed : circuit.placed) {
        std::vector<Hole> pins;
        for (const Pin& pin : placed.part->pins) pins.push_back(pin.hole);
        groups.push_back(pins);
    }
    for (const auto& lugs : built.offboardHoles) {
        for (const Hole& hole : lugs) {
            if (hole.row >= 0) groups.push_back({hole});
        }
    }
    const std::vector<int> newColumn = layout_detail::mergeColumns(built.copper, groups, fixedCols);
    auto move = [&](Hole& hole) { hole.col = newColumn[static_cast<std::size_t>(hole.col)]; };
    for (auto& holes : built.partHoles) std::for_each(holes.begin(), holes.end(), move);
    for (auto& holes : built.offboardHoles) {
        for (Hole& hole : holes) {
            if (hole.row >= 0) move(hole);
        }
    }
}

// The nets the rails carry (-1: none, or no rails wanted).
struct Rails {
    int positive = -1;
    int ground = -1;
    bool wanted() const { return positive >= 0 || ground >= 0; }
};

// Off-board supply wires go to their rail in the column they are in, when the rail's hole there
// is free: the rail is where a maker looks for them.
void wiresToRails(const LayoutCircuit& circuit, const Rails& rails, Built& built) {
    auto linkAt = [&](Hole hole) {
        return std::any_of(built.copper.links.begin(), built.copper.links.end(), [&](const auto& l) {
            return l.from.col == hole.col && l.from.row <= hole.row && hole.row <= l.to.row;
        });
    };
    for (std::size_t p = 0; p < circuit.offboard.size(); ++p) {
        for (std::size_t lug = 0; lug < circuit.offboard[p].nets.size(); ++lug) {
            Hole& hole = built.offboardHoles[p][lug];
            const int net = circuit.offboard[p].nets[lug];
            if (hole.row < 0 || net < 0) continue;
            const int railRow = net == rails.positive ? 0
                                : net == rails.ground ? built.copper.rows - 1
                                                      : -1;
            const Hole onRail{railRow, hole.col};
            if (railRow < 0 || linkAt(onRail)) continue;
            const auto& column = built.copper.owner[static_cast<std::size_t>(hole.col)];
            if (column[static_cast<std::size_t>(railRow)] != net) continue;
            hole = onRail;
        }
    }
}

// Adds the rails to a built layout; false when one cannot be joined to its net.
bool addRails(const LayoutCircuit& circuit, const Rails& rails, Built& built) {
    std::vector<std::vector<Hole>> groups = built.partHoles;
    for (const auto& lugs : built.offboardHoles) {
        for (const Hole& hole : lugs) {
            if (hole.row >= 0) groups.push_back({hole});
        }
    }
    const auto shift = layout_detail::addSupplyRails(built.copper, groups, rails.positive, rails.ground);
    if (!shift) return false;
    for (auto& holes : built.partHoles) {
        for (Hole& hole : holes) hole.row += *shift;
    }
    for (auto& holes : built.offboardHoles) {
        for (Hole& hole : holes) {
            if (hole.row >= 0) hole.row += *shift;
        }
    }
    wiresToRails(circuit, rails, built);
    return true;
}

Built build(const LayoutCircuit& circuit, const Arrangement& arrangement, int maxRows,
            const Rails& rails) {
    Built built;
    StripSweep sweep(circuit.uses, maxRows);
    int fixedCols = 0;
    for (const auto& placed : circuit.placed) {
        for (const Pin& pin : placed.part->pins) fixedCols = std::max(fixedCols, pin.hole.col + 1);
    }
    for (int col = 0; col < fixedCols; ++col) {
        std::vector<int> band;
        const std::vector<ShapePin> pins = fixedPinsAt(circuit, col, band);
        if (!sweep.placeFixed(col, pins, band)) return built;
    }
    built.partHoles.resize(circuit.parts.size());
    built.offboardHoles.resize(circuit.offboard.size());
    for (std::size_t p = 0; p < circuit.offboard.size(); ++p) {
        built.offboardHoles[p].assign(circuit.offboard[p].nets.size(), Hole{-1, -1});
    }
    for (bool right : {false, true}) {
        if (right) {
            for (int part : arrangement.order) {
                auto holes = sweep.place(circuit.parts[static_cast<std::size_t>(part)].shapes);
                if (!holes) return built;
                built.partHoles[static_cast<std::size_t>(part)] = std::move(*holes);
            }
        }
        const std::vector<int> nets = lugNets(circuit, arrangement, right);
        if (nets.empty()) continue;
        const auto holes = sweep.placeWires(nets);
        if (!holes) return built;
        scatterLugHoles(circuit, arrangement, right, *holes, built);
    }
    built.copper = sweep.finish();
    stackColumns(circuit, fixedCols, built);
    if (rails.wanted() && !addRails(circuit, rails, built)) return built;
    built.cuts = cutsBetweenNets(built.copper);
    built.score.rows = built.copper.rows;
    built.score.cols = built.copper.cols;
    built.score.links = static_cast<int>(built.copper.links.size());
    built.score.cuts = static_cast<int>(built.cuts.size());
    for (const auto& link : built.copper.links) built.score.linkLength += link.to.row - link.from.row;
    built.ok = true;
    return built;
}

// The annealing's single number: area dominates links, links cuts, cuts link length, as far
// as board sizes go.
double weight(const Built& built) {
    if (!built.ok) return 1e18;
    const LayoutScore& s = built.score;
    return static_cast<double>(s.area()) * 1e6 + s.links * 1e4 + s.cuts * 1e2 + s.linkLength;
}

ColumnProblem orderingProblem(const LayoutCircuit& circuit) {
    ColumnProblem problem;
    problem.nets = static_cast<int>(circuit.netNames.size());
    for (const auto& part : circuit.parts) {
        std::vector<int> nets = part.nets;
        std::sort(nets.begin(), nets.end());
        nets.erase(std::unique(nets.begin(), nets.end()), nets.end());
        problem.columnNets.push_back(nets);
    }
    return problem;
}

// Off-board parts go to the edge nearer the parts that share their nets.
std::vector<char> nearerEdges(const LayoutCircuit& circuit, const std::vector<int>& order) {
    std::vector<double> position(circuit.netNames.size(), 0);
    std::vector<int> count(circuit.netNames.size(), 0);
    for (std::size_t at = 0; at < order.size(); ++at) {
        for (int net : circuit.parts[static_cast<std::size_t>(order[at])].nets) {
            position[static_cast<std::size_t>(net)] += static_cast<double>(at);
            ++count[static_cast<std::size_t>(net)];
        }
    }
    std::vector<char> right;
    for (const auto& part : circuit.offboard) {
        double sum = 0;
        int n = 0;
        for (int net : part.nets) {
            if (net < 0 || count[static_cast<std::size_t>(net)] == 0) continue;
            sum += position[static_cast<std::size_t>(net)] / count[static_cast<std::size_t>(net)];
            ++n;
        }
        right.push_back(n > 0 && sum / n > (static_cast<double>(order.size()) - 1) / 2);
    }
    return right;
}

void mutate(Arrangement& arrangement, std::mt19937_64& random) {
    const auto parts = arrangement.order.size();
    const auto offboard = arrangement.rightEdge.size();
    const auto pick = random() % (parts + offboard / 2 + 1);
    if (pick >= parts && offboard > 0) {
        arrangement.rightEdge[random() % offboard] ^= 1;
        return;
    }
    if (parts < 2) return;
    const std::size_t a = random() % parts;
    std::size_t b = random() % parts;
    if (a == b) b = (b + 1) % parts;
    if (random() % 2 == 0) {
        std::swap(arrangement.order[a], arrangement.order[b]);
    } else {
        const int part = arrangement.order[a];
        arrangement.order.erase(arrangement.order.begin() + static_cast<long>(a));
        arrangement.order.insert(arrangement.order.begin() + static_cast<long>(b), part);
    }
}

std::string wireColour(const std::string& netName, int& nextColour) {
    std::string upper;
    for (char c : netName) upper += static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    if (upper == "0" || upper.find("GND") != std::string::npos || upper == "VSS" ||
        upper.find("V-") != std::string::npos)
        return "black";
    if (upper.find("VCC") != std::string::npos || upper.find("VDD") != std::string::npos ||
        upper.find("V+") != std::string::npos || upper.find('+') != std::string::npos)
        return "red";
    static const char* const kColours[] = {"yellow", "green", "blue", "white", "orange"};
    return kColours[nextColour++ % 5];
}

// Off-board parts stand beside the edge their wires go to (the board file's `place`: body's
// top-left corner in pitches; the stacking pitch and box width follow the editor's default column
// right of the board), so no wire crosses the board to reach its part.
void placeBesideTheirEdge(Board& board, const Built& built) {
    constexpr double kGap = 3.0;    // room for the row letters
    constexpr double kStack = 4.2;  // one part below the other
    int left = 0;
    int right = 0;
    for (std::size_t p = 0; p < board.offboard.size(); ++p) {
        double sum = 0;
        int wired = 0;
        for (const Hole& hole : built.offboardHoles[p]) {
            if (hole.col < 0) continue;
            sum += hole.col;
            ++wired;
        }
        if (board.offboard[p].extra.contains("place")) continue;
        const bool onLeft = wired > 0 && sum / wired < (board.cols - 1) / 2.0;
        const double width = std::max(4.0, 1.0 + 1.5 * static_cast<double>(board.offboard[p].pins.size()));
        const double x = onLeft ? -kGap - width : board.cols + kGap;
        const double y = 0.5 + kStack * (onLeft ? left++ : right++);
        board.offboard[p].extra["place"] = {{"x", x}, {"y", y}};
    }
}

Board makeBoard(const Circuit& circuit, const LayoutCircuit& described, const Built& built,
                const Board* placed) {
    Board board;
    board.title = placed != nullptr ? placed->title : "Laid out from the circuit";
    if (placed != nullptr) board.pitchMm = placed->pitchMm;
    board.rows = built.score.rows;
    board.cols = built.score.cols;
    board.cuts = built.cuts;
    for (const auto& kept : described.placed) board.parts.push_back(*kept.part);
    for (std::size_t p = 0; p < described.parts.size(); ++p) {
        const auto& toPlace = described.parts[p];
        const CircuitPart& source = circuit.parts.at(toPlace.ref);
        Part part{toPlace.ref, source.kind, source.value, {}, nlohmann::json::object()};
        for (std::size_t i = 0; i < toPlace.rule.pins.size(); ++i) {
            part.pins.push_back({toPlace.rule.pins[i], built.partHoles[p][i]});
        }
        if (toPlace.rule.shape == LeadShape::TwoLead && toPlace.rule.spans.front() >= 3) {
            const int span = std::abs(part.pins[0].hole.row - part.pins[1].hole.row);
            part.extra["body"] = span <= 2 ? "standing" : "lying";
        }
        if (source.extra.contains("pinout")) part.extra["pinout"] = source.extra["pinout"];
        board.parts.push_back(std::move(part));
    }
    for (const auto& link : built.copper.links) board.links.push_back({link.from, link.to});
    int nextColour = 0;
    std::map<int, std::vector<PinRef>> lugsOnlyNets;
    for (std::size_t p = 0; p < described.offboard.size(); ++p) {
        const auto& off = described.offboard[p];
        const CircuitPart& source = circuit.parts.at(off.ref);
        // The maker's own drawing hints (where the part was dragged to) stay.
        const OffboardPart* kept = placed != nullptr ? placed->findOffboard(off.ref) : nullptr;
        board.offboard.push_back({off.ref, source.kind, source.value, off.rule.pins,
                                  kept != nullptr ? kept->extra : nlohmann::json::object()});
        for (std::size_t lug = 0; lug < off.nets.size(); ++lug) {
            const int net = off.nets[lug];
            if (net < 0) continue;
            const PinRef end{off.ref, off.rule.pins[lug]};
            if (!described.onBoard[static_cast<std::size_t>(net)]) {
                lugsOnlyNets[net].push_back(end);
                continue;
            }
            board.wires.push_back({Endpoint::atLug(end), Endpoint::atHole(built.offboardHoles[p][lug]),
                                   wireColour(described.netNames[static_cast<std::size_t>(net)], nextColour),
                                   nlohmann::json::object()});
        }
    }
    for (const auto& [net, lugs] : lugsOnlyNets) {  // lug to lug, off the board
        for (std::size_t i = 1; i < lugs.size(); ++i) {
            board.wires.push_back({Endpoint::atLug(lugs[i - 1]), Endpoint::atLug(lugs[i]),
                                   wireColour(described.netNames[static_cast<std::size_t>(net)], nextColour),
                                   nlohmann::json::object()});
        }
    }
    placeBesideTheirEdge(board, built);
    board.circuit = circuit;
    return board;
}

LayoutBounds bounds(const LayoutCircuit& described, const ColumnProblem& problem,
                    const std::vector<int>& order) {
    LayoutBounds result;
    long footprint = 0;
    int widest = 1;
    for (const auto& part : described.parts) {
        int tallest = 1 << 30;  // the shortest shape of the part
        for (const auto& shape : part.shapes) {
            int rows = 0;
            for (const auto& pin : shape.pins) rows = std::max(rows, pin.dy + 1);
            tallest = std::min(tallest, rows);
        }
        // One column of the part holds its leads on different strips: as many as its nets
        // (a DIP's nets are shared by its two columns, so half of them at least).
        std::vector<int> nets = part.nets;
        std::sort(nets.begin(), nets.end());
        const auto distinct = std::unique(nets.begin(), nets.end()) - nets.begin();
        const int perColumn = part.rule.shape == LeadShape::Dip
                                  ? static_cast<int>((distinct + 1) / 2)
                                  : static_cast<int>(distinct);
        result.strips = std::max({result.strips, tallest, perColumn});
        // Holes no other part can use: a DIP's pins (links may pass under its body), every
        // other part's leads and the body between them.
        footprint += part.rule.shape == LeadShape::Dip ? static_cast<long>(part.nets.size()) : tallest;
        widest = std::max(widest, part.rule.shape == LeadShape::Dip ? 4 : 1);
    }
    result.area = std::max(footprint, long{result.strips} * widest);
    result.orderStrips = openStrips(problem, order);
    return result;
}

// Parts on the board that the circuit does not name: their pins have no net to lay out, so they
// cannot be kept as they stand.
std::string partsNotInCircuit(const Circuit& circuit, const Board& placed) {
    std::string refs;
    int count = 0;
    for (const Part& part : placed.parts) {
        if (circuit.parts.count(part.ref) > 0) continue;
        refs += (count++ > 0 ? ", " : "") + part.ref;
    }
    if (count == 0) return {};
    return "the board holds " + std::string(count == 1 ? "a part" : "parts") +
           " the circuit does not name (" + refs +
           "): add them to the circuit or delete them from the board first";
}

Rails railNets(const LayoutCircuit& described, const Circuit& circuit) {
    Rails rails;
    const SupplyNets supply = findSupplyNets(circuit);
    for (std::size_t net = 0; net < described.netNames.size(); ++net) {
        if (supply.positive && described.netNames[net] == *supply.positive) rails.positive = static_cast<int>(net);
        if (supply.ground && described.netNames[net] == *supply.ground) rails.ground = static_cast<int>(net);
    }
    return rails;
}

}  // namespace

LayoutResult layOut(const Circuit& circuit, const LayoutOptions& options, const Board* placed) {
    LayoutResult result;
    if (placed != nullptr) {
        result.problem = partsNotInCircuit(circuit, *placed);
        if (result.problem.empty() && options.rails && !placed->parts.empty())
            result.problem = "supply rails are laid out only from the circuit, not around parts "
                             "already placed";
        if (!result.problem.empty()) return result;
    }
    const LayoutCircuit described = layout_detail::describeCircuit(circuit, placed);
    const Rails rails = options.rails ? railNets(described, circuit) : Rails{};
    if (options.rails && !rails.wanted()) {
        result.problem = "the circuit has no supply nets for the rails (a battery or DC jack, or "
                         "nets named like VCC and GND)";
        return result;
    }
    // Room for every net at once plus a few strips to move nets across; a fixed board caps it.
    int maxRows = static_cast<int>(described.netNames.size()) + 8;
    if (placed != nullptr) maxRows = std::max(maxRows, placed->rows + 8);
    if (options.maxRows > 0) maxRows = std::min(maxRows, options.maxRows);
    if (options.maxRows > 0 && rails.wanted()) maxRows = std::min(maxRows, options.maxRows - 2);
    const ColumnProblem problem = orderingProblem(described);
    OrderOptions orderOptions;
    orderOptions.seed = options.seed;
    orderOptions.iterations = 20000;
    orderOptions.stop = options.stop;
    Arrangement current{orderColumns(problem, orderOptions).order, {}};
    current.rightEdge = nearerEdges(described, current.order);
    result.bounds = bounds(described, problem, current.order);

    Built best = build(described, current, maxRows, rails);
    Arrangement bestArrangement = current;
    double currentWeight = weight(best);
    std::mt19937_64 random(options.seed);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    const double hot = 3e6;  // about three holes of area
    const double cold = 1e2;
    long iteration = 0;
    for (; iteration < options.iterations; ++iteration) {
        if (options.stop && options.stop()) break;
        Arrangement candidate = current;
        mutate(candidate, random);
        const Built built = build(described, candidate, maxRows, rails);
        const double w = weight(built);
        const double t = hot * std::pow(cold / hot, static_cast<double>(iteration) /
                                                        static_cast<double>(options.iterations));
        if (w <= currentWeight || unit(random) < std::exp((currentWeight - w) / t)) {
            current = std::move(candidate);
            currentWeight = w;
            if (built.ok && (!best.ok || built.score.key() < best.score.key())) {
                best = built;
                bestArrangement = current;
            }
        }
        if (options.progress && iteration % 16 == 0) {
            options.progress({iteration, options.iterations, best.score});
        }
    }
    result.iterationsUsed = iteration;
    if (!best.ok) {
        result.problem = "the circuit does not fit in " + std::to_string(maxRows) + " strips";
        if (placed != nullptr) result.problem += " around the parts already placed";
        return result;
    }
    if ((options.maxRows > 0 && best.score.rows > options.maxRows) ||
        (options.maxCols > 0 && best.score.cols > options.maxCols)) {
        result.problem = "the best layout found needs " +
                         sizeInHoles(best.score.cols, best.score.rows) + ", more than the board's " +
                         sizeInHoles(options.maxCols, options.maxRows);
        result.score = best.score;
        return result;
    }
    result.bounds.orderStrips = openStrips(problem, bestArrangement.order);
    result.board = makeBoard(circuit, described, best, placed);
    result.score = best.score;
    result.ok = true;
    return result;
}

}  // namespace netcheck
