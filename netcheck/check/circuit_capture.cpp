#include "netcheck/check/circuit_capture.hpp"

#include <algorithm>
#include <set>

#include "netcheck/check/connectivity.hpp"

namespace netcheck {

namespace {

std::string keptName(const Board& board, const std::vector<PinRef>& group) {
    if (!board.circuit) return {};
    std::set<std::string> names;
    for (const auto& pin : group)
        if (auto net = board.circuit->netOf(pin)) names.insert(*net);
    return names.size() == 1 ? *names.begin() : std::string{};
}

}  // namespace

std::vector<std::vector<PinRef>> boardNets(const Board& board) {
    const Connectivity copper(board);
    std::vector<std::vector<PinRef>> byIsland(static_cast<std::size_t>(copper.islandCount()));
    auto add = [&](int island, PinRef pin) {
        if (island >= 0) byIsland[static_cast<std::size_t>(island)].push_back(std::move(pin));
    };
    for (const Part& part : board.parts) {
        for (const Pin& pin : part.pins) add(copper.islandOfHole(pin.hole), {part.ref, pin.name});
    }
    for (const OffboardPart& part : board.offboard) {
        for (const std::string& lug : part.pins) {
            add(copper.islandOfPin({part.ref, lug}), {part.ref, lug});
        }
    }
    std::vector<std::vector<PinRef>> groups;
    for (auto& pins : byIsland) {
        if (pins.empty()) continue;
        std::sort(pins.begin(), pins.end());
        groups.push_back(std::move(pins));
    }
    std::sort(groups.begin(), groups.end());
    return groups;
}

Circuit captureCircuit(const Board& board) {
    Circuit circuit;
    for (const Part& part : board.parts) {
        CircuitPart cp{part.kind, part.value, {}, nlohmann::json::object()};
        for (const auto& pin : part.pins) cp.pins.push_back(pin.name);
        circuit.parts[part.ref] = cp;
    }
    for (const OffboardPart& part : board.offboard)
        circuit.parts[part.ref] =
            CircuitPart{part.kind, part.value, part.pins, nlohmann::json::object()};
    int counter = 0;
    for (const auto& group : boardNets(board)) {
        if (group.size() < 2) continue;
        std::string name = keptName(board, group);
        while (name.empty() || circuit.nets.count(name)) name = "N" + std::to_string(++counter);
        circuit.nets[name] = group;
    }
    return circuit;
}

}  // namespace netcheck
