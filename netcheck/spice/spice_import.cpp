// Deck -> scopes -> expanded parts -> Circuit. Nothing reaches the result unless the whole deck
// was read without error.
#include "netcheck/spice/spice_import.hpp"

#include <algorithm>
#include <cctype>
#include <unordered_map>

#include "netcheck/model/name_rules.hpp"
#include "netcheck/spice/detail/spice_deck.hpp"
#include "netcheck/spice/detail/spice_elements.hpp"
#include "netcheck/spice/detail/spice_subckt.hpp"

namespace netcheck {

namespace {

using spice::DeckError;
using spice::ElementPart;

std::set<std::string> modelNames(const spice::Deck& deck) {
    std::set<std::string> names;
    for (const spice::DeckLine& line : deck.lines) {
        if (line.type == spice::DeckLine::Type::Command && line.fields.size() > 1 &&
            spice::lower(line.fields[0].text) == ".model") {
            names.insert(spice::lower(line.fields[1].text));
        }
    }
    return names;
}

std::string netName(const std::string& key, const spice::NodeNames& names,
                    const std::map<std::string, std::string>& overrides,
                    const SpiceOptions& options) {
    if (const auto o = overrides.find(key); o != overrides.end()) return o->second;
    if (key == "0") return options.groundName;
    return names.shown.at(key);
}

// The deck's own syntax already keeps out blanks and most control characters; C1 controls and
// no-break or zero-width spaces are well-formed UTF-8 and arrive here.
void requireUsableNames(const ElementPart& part) {
    if (const auto problem = refProblem(part.ref)) {
        throw DeckError{part.line, "part ref " + part.ref + " " + *problem};
    }
    if (const auto problem = textProblem(part.value)) {
        throw DeckError{part.line, "the value of " + part.ref + " " + *problem};
    }
}

Circuit buildCircuit(const std::vector<ElementPart>& parts, const spice::NodeNames& names,
                     const std::map<std::string, std::string>& overrides,
                     const SpiceOptions& options) {
    Circuit circuit;
    std::unordered_map<std::string, int> refLines;  // ref identity -> line
    std::map<std::string, std::string> keyOfNet;    // net name -> node key, to catch clashes
    for (const ElementPart& part : parts) {
        requireUsableNames(part);
        if (const auto [first, fresh] = refLines.emplace(refIdentity(part.ref), part.line);
            !fresh) {
            throw DeckError{part.line, "part ref " + part.ref + " (from " + part.name +
                                           ") is used twice (also line " +
                                           std::to_string(first->second) + ")"};
        }
        circuit.parts[part.ref] =
            CircuitPart{part.kind, part.value, part.pins, nlohmann::json::object()};
        for (std::size_t i = 0; i < part.pins.size(); ++i) {
            const std::string net = netName(part.nodes[i], names, overrides, options);
            if (net.empty()) continue;  // `*@net NODE` without a name: the pin is left unconnected
            const auto [at, added] = keyOfNet.emplace(net, part.nodes[i]);
            if (!added && at->second != part.nodes[i]) {
                throw DeckError{part.line, "two different nodes are both named " + net +
                                               " (check *@net lines and the ground name)"};
            }
            circuit.nets[net].push_back(PinRef{part.ref, part.pins[i]});
        }
    }
    for (auto& [name, pins] : circuit.nets) std::sort(pins.begin(), pins.end());
    return circuit;
}

// Length of the well-formed UTF-8 sequence at `at` (RFC 3629: no overlong forms, no surrogates,
// nothing above U+10FFFF), or 0 when the bytes there are not UTF-8.
std::size_t utf8Length(std::string_view text, std::size_t at) {
    const auto byte = [&](std::size_t i) {
        return i < text.size() ? static_cast<unsigned char>(text[i]) : 0u;
    };
    const unsigned lead = byte(at);
    if (lead < 0x80) return 1;
    std::size_t length = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : lead >= 0xc2 ? 2 : 0;
    if (length == 0 || lead > 0xf4) return 0;
    const unsigned second = byte(at + 1);
    const unsigned low = lead == 0xe0 ? 0xa0 : lead == 0xf0 ? 0x90 : 0x80;
    const unsigned high = lead == 0xed ? 0x9f : lead == 0xf4 ? 0x8f : 0xbf;
    if (second < low || second > high) return 0;
    for (std::size_t i = 2; i < length; ++i) {
        if ((byte(at + i) & 0xc0u) != 0x80u) return 0;
    }
    return length;
}

// A deck is UTF-8 text: a control character or a broken byte sequence would end up in a name no
// circuit file can hold (both found by fuzzing). Tabs, form feeds and line ends are the deck's own
// separators.
void requirePlainText(std::string_view text) {
    int line = 1;
    for (std::size_t at = 0; at < text.size(); ++at) {
        const char c = text[at];
        if (c == '\n') {
            ++line;
            continue;
        }
        const std::size_t length = utf8Length(text, at);
        if (length == 0) throw DeckError{line, "the deck is not UTF-8 text (a broken byte sequence)"};
        at += length - 1;
        const auto byte = static_cast<unsigned char>(c);
        if ((byte < 0x20 && c != '\t' && c != '\r' && c != '\f' && c != '\v') || byte == 0x7f) {
            throw DeckError{line, "control character (byte " + std::to_string(byte) +
                                      ") in the deck; a deck is plain text"};
        }
    }
}

}  // namespace

ReadResult<Circuit> importSpice(std::string_view text, std::string_view fileName,
                                const SpiceOptions& options, const ReadLimits& limits) {
    ReadResult<Circuit> result;
    spice::ReadContext context{std::string(fileName), &result.notes, {}};
    try {
        if (text.size() > limits.maxBytes) {
            throw DeckError{
                0, "the deck is larger than " + std::to_string(limits.maxBytes) + " bytes"};
        }
        requirePlainText(text);
        const spice::Deck deck = spice::readDeck(text);
        for (const auto& [line, remark] : deck.notes) context.note(line, remark);
        context.modelNames = modelNames(deck);
        const spice::DeckScopes scopes = spice::collectScopes(
            deck, context, options.sources == SpiceOptions::Sources::Offboard, limits);
        spice::checkCalls(scopes, limits);
        spice::NodeNames names;
        std::map<std::string, std::string> overrides;
        const std::vector<ElementPart> parts =
            spice::expandTop(scopes, options.flatten, context, limits, names, overrides);
        if (parts.empty())
            throw DeckError{0, "the deck has no parts (is the first line the title?)"};
        result.value = buildCircuit(parts, names, overrides, options);
    } catch (const DeckError& e) {
        result.value.reset();
        result.error = FileError{std::string(fileName), e.line, 0, "", e.message};
    }
    return result;
}

bool looksLikeSpiceDeck(std::string_view text, std::string_view fileName) {
    const std::size_t dot = fileName.rfind('.');
    if (dot != std::string_view::npos) {
        const std::string ext = spice::lower(fileName.substr(dot));
        if (ext == ".json") return false;
        for (const char* deck : {".cir", ".sp", ".spice", ".net", ".ckt"}) {
            if (ext == deck) return true;
        }
    }
    const auto first = std::find_if(text.begin(), text.end(), [](char c) {
        return std::isspace(static_cast<unsigned char>(c)) == 0;
    });
    return first != text.end() && *first != '{';
}

}  // namespace netcheck
