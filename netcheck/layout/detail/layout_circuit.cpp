#include "netcheck/layout/detail/layout_circuit.hpp"

#include <algorithm>

namespace netcheck::layout_detail {

namespace {

// Two-lead shapes: each allowed span, either lead on top; the body covers the holes between.
std::vector<Shape> twoLeadShapes(const std::vector<int>& nets, const std::vector<int>& spans) {
    std::vector<Shape> shapes;
    for (std::size_t i = 0; i < spans.size(); ++i) {
        const int span = spans[i];
        for (int flip = 0; flip < 2; ++flip) {
            Shape shape;
            shape.pins = {{nets[0], flip ? span : 0, 0}, {nets[1], flip ? 0 : span, 0}};
            for (int row = 1; row < span; ++row) shape.body.push_back({row, 0});
            shape.preference = static_cast<int>(i);
            shapes.push_back(shape);
        }
    }
    return shapes;
}

// In-line shapes: the pins down one column in order, or turned round.
std::vector<Shape> inLineShapes(const std::vector<int>& nets) {
    const int count = static_cast<int>(nets.size());
    std::vector<Shape> shapes(2);
    for (int i = 0; i < count; ++i) {
        shapes[0].pins.push_back({nets[static_cast<std::size_t>(i)], i, 0});
        shapes[1].pins.push_back({nets[static_cast<std::size_t>(i)], count - 1 - i, 0});
    }
    shapes[1].preference = 1;
    return shapes;
}

// DIP shapes: pin 1 at the top left (pins down the left column, back up the right), or the IC
// turned round (pin 1 at the bottom right). The strips under it die between the columns.
std::vector<Shape> dipShapes(const std::vector<int>& nets) {
    const int count = static_cast<int>(nets.size());
    const int half = count / 2;
    std::vector<Shape> shapes(2);
    for (int i = 0; i < count; ++i) {
        const int net = nets[static_cast<std::size_t>(i)];
        const bool first = i < half;
        shapes[0].pins.push_back({net, first ? i : count - 1 - i, first ? 0 : 3});
        shapes[1].pins.push_back({net, first ? half - 1 - i : i - half, first ? 3 : 0});
    }
    for (Shape& shape : shapes) {
        shape.width = 4;
        shape.bandRows = half;
        for (int row = 0; row < half; ++row) {
            shape.body.push_back({row, 1});
            shape.body.push_back({row, 2});
        }
    }
    shapes[1].preference = 1;
    return shapes;
}

// A placed IC whose first half of pins stands down one column and the rest in the column 3 to
// the right: its strips end under it, as for the DIPs the engine places.
int dipColumnOf(const Part& part) {
    const std::size_t count = part.pins.size();
    if (part.kind != "ic" || count < 4 || count % 2 != 0) return -1;
    const int left = part.pins.front().hole.col;
    for (std::size_t i = 0; i < count; ++i) {
        const int expected = i < count / 2 ? left : left + 3;
        if (part.pins[i].hole.col != expected) return -1;
    }
    return left;
}

}  // namespace

LayoutCircuit describeCircuit(const Circuit& circuit, const Board* placed) {
    LayoutCircuit result;
    std::map<PinRef, int> netOfPin;
    for (const auto& [name, pins] : circuit.nets) {
        const int net = static_cast<int>(result.netNames.size());
        result.netNames.push_back(name);
        for (const PinRef& pin : pins) netOfPin.emplace(pin, net);
    }
    auto netOf = [&](const std::string& ref, const std::string& pin) {
        const auto found = netOfPin.find({ref, pin});
        if (found != netOfPin.end()) return found->second;
        result.netNames.push_back(ref + "." + pin);  // a pin on no net: copper of its own
        return static_cast<int>(result.netNames.size()) - 1;
    };
    std::map<std::string, std::vector<std::string>> usedPins;
    for (const auto& [name, pins] : circuit.nets) {
        for (const PinRef& pin : pins) usedPins[pin.ref].push_back(pin.pin);
    }
    for (const auto& [ref, part] : circuit.parts) {
        const Part* onBoard = placed != nullptr ? placed->findPart(ref) : nullptr;
        if (onBoard != nullptr) {
            PlacedPart kept{onBoard, {}, dipColumnOf(*onBoard)};
            for (const Pin& pin : onBoard->pins) kept.nets.push_back(netOf(ref, pin.name));
            result.placed.push_back(kept);
            continue;
        }
        LeadRule rule = leadRule(part, usedPins[ref]);
        std::vector<int> nets;
        for (const std::string& pin : rule.pins) {
            const bool used = netOfPin.count({ref, pin}) > 0;
            nets.push_back(rule.shape == LeadShape::OffBoard && !used ? -1 : netOf(ref, pin));
        }
        if (rule.shape == LeadShape::OffBoard) {
            result.offboard.push_back({ref, std::move(rule), std::move(nets)});
            continue;
        }
        PartToPlace toPlace{ref, std::move(rule), std::move(nets), {}};
        switch (toPlace.rule.shape) {
            case LeadShape::TwoLead: toPlace.shapes = twoLeadShapes(toPlace.nets, toPlace.rule.spans); break;
            case LeadShape::Dip: toPlace.shapes = dipShapes(toPlace.nets); break;
            default: toPlace.shapes = inLineShapes(toPlace.nets); break;
        }
        result.parts.push_back(std::move(toPlace));
    }
    if (placed != nullptr) {  // parts on the board that the circuit does not name stay too
        for (const Part& part : placed->parts) {
            if (circuit.parts.count(part.ref) > 0) continue;
            PlacedPart kept{&part, {}, -1};
            for (const Pin& pin : part.pins) kept.nets.push_back(netOf(part.ref, pin.name));
            result.placed.push_back(kept);
        }
    }
    const std::size_t nets = result.netNames.size();
    result.onBoard.assign(nets, 0);
    result.uses.assign(nets, 0);
    auto countPins = [&](const std::vector<int>& pinNets) {
        for (int net : pinNets) {
            result.onBoard[static_cast<std::size_t>(net)] = 1;
            ++result.uses[static_cast<std::size_t>(net)];
        }
    };
    for (const PartToPlace& part : result.parts) countPins(part.nets);
    for (const PlacedPart& part : result.placed) countPins(part.nets);
    for (const OffboardToWire& part : result.offboard) {
        for (int net : part.nets) {
            if (net >= 0 && result.onBoard[static_cast<std::size_t>(net)]) {
                ++result.uses[static_cast<std::size_t>(net)];
            }
        }
    }
    return result;
}

}  // namespace netcheck::layout_detail
