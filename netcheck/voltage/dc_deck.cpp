#include "netcheck/voltage/dc_deck.hpp"

#include <algorithm>
#include <cctype>
#include <map>

#include "netcheck/voltage/value_reading.hpp"

namespace netcheck {

namespace {

/// Node names are lower case letters, digits and '_' (ngspice folds case, and vector names must
/// read back exactly).
std::string nodeName(int index, const std::string& net) {
    std::string name = "n" + std::to_string(index) + "_";
    for (char c : net) {
        name += std::isalnum(static_cast<unsigned char>(c)) != 0
                    ? static_cast<char>(std::tolower(static_cast<unsigned char>(c)))
                    : '_';
    }
    return name.substr(0, 40);
}

std::string elementName(int index, const std::string& ref) {
    std::string name = std::to_string(index) + "_";
    for (char c : ref) {
        name += std::isalnum(static_cast<unsigned char>(c)) != 0
                    ? static_cast<char>(std::tolower(static_cast<unsigned char>(c)))
                    : '_';
    }
    return name.substr(0, 40);
}

const nlohmann::json& modelSettings(const nlohmann::json& extra) {
    static const nlohmann::json kNone = nlohmann::json::object();
    if (extra.is_object()) {
        const auto found = extra.find("spice_model");
        if (found != extra.end() && found->is_object()) return *found;
    }
    return kNone;
}

/// The board's value and "spice_model" settings of a part, on or off the board.
struct BoardSide {
    std::string value;
    nlohmann::json settings = nlohmann::json::object();
};
std::optional<BoardSide> boardSide(const Board* board, const std::string& ref) {
    if (board == nullptr) return std::nullopt;
    if (const Part* part = board->findPart(ref)) {
        return BoardSide{part->value, modelSettings(part->extra)};
    }
    if (const OffboardPart* part = board->findOffboard(ref)) {
        return BoardSide{part->value, modelSettings(part->extra)};
    }
    return std::nullopt;
}

}  // namespace

int findGround(const std::vector<DcNet>& nets, const std::vector<DcPart>& parts) {
    static const std::vector<std::string> kNames{"gnd", "0", "0v", "ground", "vss", "com"};
    for (std::size_t i = 0; i < nets.size(); ++i) {
        const std::string name = lowerCase(nets[i].name);
        if (std::find(kNames.begin(), kNames.end(), name) != kNames.end()) {
            return static_cast<int>(i);
        }
    }
    for (const DcPart& part : parts) {
        if (part.model.supply && part.model.role == DcModel::Role::Simulated &&
            part.netOfPin[1] >= 0) {
            return part.netOfPin[1];
        }
    }
    return -1;
}

std::vector<std::string> DcDeck::lines(const DeckValues& values) const {
    std::vector<std::string> out{"* Stripsmith: DC operating point of the intended circuit"};
    for (std::size_t i = 0; i < parts.size(); ++i) {
        const DcPart& part = parts[i];
        if (part.model.role != DcModel::Role::Simulated) continue;
        out.push_back("* " + part.ref + " (" + part.part.kind + " " + part.part.value + ")");
        const std::string name = elementName(static_cast<int>(i), part.ref);
        for (std::string& line : part.model.write(name, part.nodes, values[i])) {
            out.push_back(std::move(line));
        }
    }
    out.push_back(".options rshunt=1e12");
    out.push_back(".end");
    return out;
}

DeckValues DcDeck::nominal() const {
    DeckValues values;
    for (const DcPart& part : parts) values.push_back(nominalValues(part.model));
    return values;
}

std::vector<std::string> DcDeck::nodes() const {
    std::vector<std::string> out;
    for (const DcNet& net : nets) out.push_back(net.node);
    return out;
}

DcDeckResult buildDcDeck(const Circuit& circuit, const Board* board,
                         const DcModelOptions& options) {
    DcDeck deck;
    std::map<PinRef, int> netOfPin;
    for (const auto& [name, pins] : circuit.nets) {
        const int index = static_cast<int>(deck.nets.size());
        deck.nets.push_back({name, nodeName(index, name), pins});
        for (const PinRef& pin : pins) netOfPin[pin] = index;
    }
    for (const auto& [ref, circuitPart] : circuit.parts) {
        DcPart part{ref, circuitPart, {}, {}, {}};
        nlohmann::json settings = modelSettings(circuitPart.extra);
        if (const auto side = boardSide(board, ref)) {
            if (part.part.value.empty()) part.part.value = side->value;
            for (const auto& [key, value] : side->settings.items()) settings[key] = value;
        }
        part.model = dcModelFor(part.part, settings, options);
        for (const std::string& pin : part.model.pins) {
            const auto found = netOfPin.find(PinRef{ref, pin});
            part.netOfPin.push_back(found != netOfPin.end() ? found->second : -1);
        }
        deck.parts.push_back(std::move(part));
    }
    const bool anySupply = std::any_of(deck.parts.begin(), deck.parts.end(), [](const DcPart& p) {
        return p.model.supply && p.model.role == DcModel::Role::Simulated;
    });
    if (!anySupply) {
        std::string error = "the circuit has no supply: add a battery or DC jack part with its "
                            "voltage in the value (e.g. 9V)";
        for (const DcPart& part : deck.parts) {
            if (part.part.kind == "battery" || part.part.kind == "dc-jack") {
                error = part.ref + " (" + part.part.kind + " \"" + part.part.value +
                        "\"): " + part.model.reason;
                break;
            }
        }
        return {std::nullopt, error};
    }
    deck.ground = findGround(deck.nets, deck.parts);
    if (deck.ground < 0) {
        return {std::nullopt,
                "the circuit has no ground: name the 0 V net GND, or join the battery's or DC "
                "jack's - terminal to a net"};
    }
    deck.nets[static_cast<std::size_t>(deck.ground)].node = "0";
    int unconnected = 0;
    for (DcPart& part : deck.parts) {
        for (const int net : part.netOfPin) {
            part.nodes.push_back(net >= 0 ? deck.nets[static_cast<std::size_t>(net)].node
                                          : "nc_" + std::to_string(unconnected++));
        }
    }
    return {std::move(deck), {}};
}

}  // namespace netcheck
