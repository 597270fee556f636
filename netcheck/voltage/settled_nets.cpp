#include "netcheck/voltage/settled_nets.hpp"

#include <cmath>
#include <deque>
#include <map>
#include <set>

namespace netcheck {

namespace {

using Edges = std::vector<std::vector<int>>;

/// Nets reached from `starts` over `edges` without entering a net in `blocked`.
std::vector<bool> reach(const Edges& edges, const std::vector<int>& starts,
                        const std::vector<bool>& blocked) {
    std::vector<bool> seen(edges.size(), false);
    std::deque<int> queue(starts.begin(), starts.end());
    for (const int start : starts) seen[static_cast<std::size_t>(start)] = true;
    while (!queue.empty()) {
        const int net = queue.front();
        queue.pop_front();
        for (const int next : edges[static_cast<std::size_t>(net)]) {
            const auto n = static_cast<std::size_t>(next);
            if (seen[n] || blocked[n]) continue;
            seen[n] = true;
            queue.push_back(next);
        }
    }
    return seen;
}

void join(Edges& edges, int a, int b) {
    if (a < 0 || b < 0 || a == b) return;
    edges[static_cast<std::size_t>(a)].push_back(b);
    edges[static_cast<std::size_t>(b)].push_back(a);
}

double voltageAt(const DcPart& part, int pin, const std::vector<double>& volts) {
    const int net = part.netOfPin[static_cast<std::size_t>(pin)];
    return net >= 0 ? volts[static_cast<std::size_t>(net)] : 0.0;
}

}  // namespace

std::vector<NetSettlement> settleNets(const DcDeck& deck, const std::vector<double>& volts) {
    const std::size_t count = deck.nets.size();
    Edges sources(count), conducting(count);
    for (const DcPart& part : deck.parts) {
        if (part.model.role != DcModel::Role::Simulated) continue;
        for (const DcPath& path : part.model.paths) {
            const int a = part.netOfPin[static_cast<std::size_t>(path.a)];
            const int b = part.netOfPin[static_cast<std::size_t>(path.b)];
            if (path.source) join(sources, a, b);
            const bool on = path.sensePlus < 0 ||
                            voltageAt(part, path.sensePlus, volts) -
                                    voltageAt(part, path.senseMinus, volts) >=
                                path.threshold;
            if (on) join(conducting, a, b);
        }
    }
    // Parts with no model, by the nets their pins are on.
    std::map<int, std::set<std::string>> leftOutOn;
    std::map<std::string, const DcPart*> byRef;
    for (const DcPart& part : deck.parts) byRef[part.ref] = &part;
    for (std::size_t net = 0; net < count; ++net) {
        for (const PinRef& pin : deck.nets[net].pins) {
            const auto found = byRef.find(pin.ref);
            if (found != byRef.end() && found->second->model.role == DcModel::Role::LeftOut) {
                leftOutOn[static_cast<int>(net)].insert(pin.ref);
            }
        }
    }
    const std::vector<bool> none(count, false);
    const std::vector<bool> stiff = reach(sources, {deck.ground}, none);
    std::vector<bool> blocked(count, false);
    std::vector<int> unknown;
    for (const auto& [net, refs] : leftOutOn) {
        if (stiff[static_cast<std::size_t>(net)]) continue;
        blocked[static_cast<std::size_t>(net)] = true;
        unknown.push_back(net);
    }
    const std::vector<bool> known = reach(conducting, {deck.ground}, blocked);
    // Nets joined to an unknown one without a path to ground of their own follow it.
    const std::vector<bool> throughUnknown = reach(conducting, unknown, stiff);

    std::vector<NetSettlement> settled(count);
    for (std::size_t net = 0; net < count; ++net) {
        if (known[net] && !std::isnan(volts[net])) continue;
        const auto on = leftOutOn.find(static_cast<int>(net));
        if (on != leftOutOn.end()) {
            std::string refs;
            for (const std::string& ref : on->second) refs += (refs.empty() ? "" : ", ") + ref;
            settled[net] = {NetState::Unknown, "on a pin of " + refs + ", which has no model"};
        } else if (std::isnan(volts[net])) {
            // No simulated part touches it: the deck has no such node.
            settled[net] = {NetState::NoDcPath, "no DC path: only capacitors or connectors on it"};
        } else if (throughUnknown[net]) {
            settled[net] = {NetState::Unknown,
                            "set only through the nets of parts with no model"};
        } else {
            settled[net] = {NetState::NoDcPath,
                            "no DC path to ground (only capacitors, or parts carrying no current)"};
        }
    }
    return settled;
}

}  // namespace netcheck
