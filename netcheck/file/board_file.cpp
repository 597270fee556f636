// Board file v1: reading with the first problem located by JSON path and line, and writing in a
// stable key order so that saved files diff well.
#include "netcheck/file/board_file.hpp"

#include <map>
#include <set>
#include <sstream>
#include <unordered_map>

#include "netcheck/file/circuit_json.hpp"
#include "netcheck/file/detail/json_reader.hpp"
#include "netcheck/model/board_size.hpp"
#include "netcheck/model/name_rules.hpp"

namespace netcheck {

namespace {

// "0.5", "10": a bound as a maker writes it.
std::string millimetres(double mm) {
    std::ostringstream text;
    text << mm;
    return text.str();
}

/// Reads one parsed document into a Board, failing at the first problem.
class BoardReader {
public:
    BoardReader(JsonReader& reader, const ReadLimits& limits) : r_(reader), limits_(limits) {}

    Board read(const Json& root) {
        readHeader(root);
        board_.title = r_.stringMember(root, "title", false);
        readGrid(r_.require(root, "board"));
        forEach(root, "cuts", [this](const Json& v) { readCut(v); });
        forEach(root, "parts", [this](const Json& v) { readPart(v); });
        forEach(root, "links", [this](const Json& v) { readLink(v); });
        forEach(root, "offboard", [this](const Json& v) { readOffboard(v); });
        forEach(root, "wires", [this](const Json& v) { readWire(v); });
        if (const Json* circuit = JsonReader::find(root, "circuit")) {
            const auto step = r_.enter("circuit");
            board_.circuit = readCircuitObject(r_, *circuit, limits_);
        }
        board_.extra = r_.extras(root, {"format", "version", "title", "board", "cuts", "parts",
                                        "links", "offboard", "wires", "circuit"});
        return std::move(board_);
    }

private:
    void readHeader(const Json& root) {
        if (!JsonReader::find(root, "format")) {
            r_.fail("missing \"format\" (a board file starts with \"format\": \"" +
                    std::string(kBoardFormat) + "\")");
        }
        const std::string format = r_.stringMember(root, "format", true);
        if (format != kBoardFormat) {
            const auto step = r_.enter("format");
            r_.fail("format is " + inQuotes(format) + ", expected " + inQuotes(kBoardFormat));
        }
        const Json& versionValue = r_.require(root, "version");
        const auto step = r_.enter("version");
        const long long version = r_.asInteger(versionValue);
        if (version < 1) r_.fail("version " + std::to_string(version) + " is not a valid version");
        if (version > kBoardVersion) {
            InvalidInput newer{r_.path(),
                               "version " + std::to_string(version) +
                                   " is newer than this program reads (" +
                                   std::to_string(kBoardVersion) + ")",
                               true};
            throw newer;
        }
    }

    int readSize(const Json& grid, std::string_view key, int limit) {
        const Json& value = r_.require(grid, key);
        const auto step = r_.enter(std::string(key));
        const long long size = r_.asInteger(value);
        if (size < 1) r_.fail(std::string(key) + " must be at least 1");
        if (size > limit) {
            r_.fail(std::string(key) + " " + std::to_string(size) + " is above the limit of " +
                    std::to_string(limit));
        }
        return static_cast<int>(size);
    }

    void readGrid(const Json& grid) {
        const auto step = r_.enter("board");
        r_.expectObject(grid);
        board_.rows = readSize(grid, "rows", limits_.maxRows);
        board_.cols = readSize(grid, "cols", limits_.maxCols);
        if (const Json* pitch = JsonReader::find(grid, "pitch_mm")) {
            const auto at = r_.enter("pitch_mm");
            if (!pitch->is_number() || !(pitch->get<double>() > 0)) {
                r_.fail("pitch_mm must be a positive number of millimetres");
            }
            board_.pitchMm = pitch->get<double>();
            if (board_.pitchMm < limits_.minPitchMm || board_.pitchMm > limits_.maxPitchMm) {
                r_.fail("pitch_mm " + pitch->dump() + " is outside " +
                        millimetres(limits_.minPitchMm) + " to " + millimetres(limits_.maxPitchMm) +
                        " mm (stripboard is 2.54 mm)");
            }
        }
        const std::string copper = r_.stringMember(grid, "copper", false);
        if (copper == "pads") {
            board_.copper = CopperPattern::Pads;
        } else if (copper.empty() || copper == "strips") {
            board_.copper = CopperPattern::Strips;
        } else {
            const auto at = r_.enter("copper");
            r_.fail("copper " + inQuotes(copper) + " is not known (use \"strips\" or \"pads\")");
        }
        board_.boardExtra = r_.extras(grid, {"rows", "cols", "pitch_mm", "copper"});
    }

    template <class ReadItem>
    void forEach(const Json& root, std::string_view key, ReadItem readItem) {
        const Json* list = JsonReader::find(root, key);
        if (!list) return;
        const auto step = r_.enter(std::string(key));
        r_.expectArray(*list);
        for (std::size_t i = 0; i < list->size(); ++i) {
            const auto at = r_.enter(i);
            readItem((*list)[i]);
        }
    }

    // A hole named by the current value, inside the board.
    Hole holeAt(const Json& value) {
        const std::string name = r_.asString(value);
        const auto hole = parseHole(name);
        if (!hole) {
            r_.fail("hole name " + inQuotes(name) + " is not a row letter followed by a number");
        }
        expectInside(*hole, name);
        return *hole;
    }

    void expectInside(Hole hole, std::string_view name) const {
        if (!board_.contains(hole)) {
            r_.fail("hole " + inQuotes(name) + " is outside the board (" +
                    sizeInHoles(board_.cols, board_.rows) + ")");
        }
    }

    Hole holeMember(const Json& object, std::string_view key) {
        const Json& value = r_.require(object, key);
        const auto step = r_.enter(std::string(key));
        return holeAt(value);
    }

    void readCut(const Json& value) {
        if (board_.copper == CopperPattern::Pads) {
            r_.fail("cuts are not possible on a \"pads\" board");
        }
        const std::string text = r_.asString(value);
        const std::size_t bar = text.find('|');
        Cut cut;
        if (bar == std::string::npos) {
            cut.hole = holeAt(value);
        } else {
            cut = betweenCut(text.substr(0, bar), text.substr(bar + 1), text);
        }
        const std::string name = cutName(cut);
        const auto [it, fresh] = cutWhere_.emplace(name, r_.pathText());
        if (!fresh) r_.fail("duplicate cut " + inQuotes(name) + " (also at " + it->second + ")");
        board_.cuts.push_back(cut);
    }

    Cut betweenCut(const std::string& left, const std::string& right, const std::string& text) {
        const auto a = parseHole(left);
        const auto b = parseHole(right);
        if (!a || !b) {
            r_.fail("cut " + inQuotes(text) +
                    " is not a hole (C5) or two holes of one strip (D7|D8)");
        }
        expectInside(*a, left);
        expectInside(*b, right);
        if (a->row != b->row || (a->col - b->col != 1 && b->col - a->col != 1)) {
            r_.fail(inQuotes(text) + " is not between two adjacent holes of one strip");
        }
        return Cut{std::min(*a, *b), Cut::Kind::Between};
    }

    std::string readRef(const Json& object) {
        const std::string ref = r_.stringMember(object, "ref", true);
        const std::string where = r_.pathText();
        const auto step = r_.enter("ref");
        r_.expectRef(ref);
        const auto [it, fresh] = refWhere_.emplace(refIdentity(ref), RefSeen{ref, where});
        if (!fresh) {
            const RefSeen& first = it->second;
            r_.fail("duplicate ref " + inQuotes(ref) + " (also at " + first.where +
                    (first.ref == ref ? ")"
                                      : " as " + inQuotes(first.ref) +
                                            "; refs that differ only in case are one part)"));
        }
        if (refWhere_.size() > limits_.maxParts) {
            r_.fail("more than " + std::to_string(limits_.maxParts) + " parts");
        }
        return ref;
    }

    void readPart(const Json& object) {
        r_.expectObject(object);
        Part part;
        part.ref = readRef(object);
        part.kind = r_.textMember(object, "kind", true);
        part.value = r_.textMember(object, "value", false);
        part.extra = r_.extras(object, {"ref", "kind", "value", "pins"});
        const Json& pins = r_.require(object, "pins");
        const auto step = r_.enter("pins");
        r_.expectObject(pins);
        for (const auto& [name, hole] : pins.items()) {
            const auto at = r_.enter(name);
            r_.expectPinName(name, "pin name");
            part.pins.push_back(Pin{name, holeAt(hole)});
        }
        board_.parts.push_back(std::move(part));
    }

    void readLink(const Json& object) {
        r_.expectObject(object);
        Link link;
        link.from = holeMember(object, "from");
        link.to = holeMember(object, "to");
        if (link.from == link.to) r_.fail("link joins hole " + holeName(link.from) + " to itself");
        const std::string side = r_.stringMember(object, "side", false);
        if (!side.empty() && side != "component" && side != "copper") {
            const auto step = r_.enter("side");
            r_.fail("side must be \"component\" or \"copper\", not " + inQuotes(side));
        }
        link.copperSide = side == "copper";
        if (auto it = object.find("insulated"); it != object.end()) {
            const auto step = r_.enter("insulated");
            if (!it->is_boolean()) r_.fail("insulated must be true or false");
            link.insulated = it->get<bool>();
        }
        link.extra = r_.extras(object, {"from", "to", "side", "insulated"});
        board_.links.push_back(std::move(link));
    }

    void readOffboard(const Json& object) {
        r_.expectObject(object);
        OffboardPart part;
        part.ref = readRef(object);
        part.kind = r_.textMember(object, "kind", true);
        part.value = r_.textMember(object, "value", false);
        part.extra = r_.extras(object, {"ref", "kind", "value", "pins"});
        const Json& pins = r_.require(object, "pins");
        const auto step = r_.enter("pins");
        part.pins = r_.asStringArray(pins);
        std::set<std::string_view> seen;
        for (std::size_t i = 0; i < part.pins.size(); ++i) {
            const auto at = r_.enter(i);
            r_.expectPinName(part.pins[i], "lug name");
            if (!seen.insert(part.pins[i]).second) {
                r_.fail("lug " + inQuotes(part.pins[i]) + " is listed twice");
            }
        }
        board_.offboard.push_back(std::move(part));
    }

    Endpoint endpointMember(const Json& object, std::string_view key) {
        const Json& value = r_.require(object, key);
        const auto step = r_.enter(std::string(key));
        const std::string text = r_.asString(value);
        if (text.find('.') == std::string::npos) {
            if (!parseHole(text)) {
                r_.fail("wire end " + inQuotes(text) +
                        " is not a hole (like B3) or an off-board lug (like VR1.2)");
            }
            return Endpoint::atHole(holeAt(value));
        }
        const auto lug = PinRef::parse(text);
        if (!lug) r_.fail("wire end " + inQuotes(text) + " is not written REF.PIN (like VR1.2)");
        expectLug(*lug, text);
        return Endpoint::atLug(*lug);
    }

    void expectLug(const PinRef& lug, const std::string& text) const {
        const OffboardPart* part = board_.findOffboard(lug.ref);
        if (!part) {
            if (board_.findPart(lug.ref)) {
                r_.fail(inQuotes(text) + " is a pin of on-board part " + lug.ref +
                        ": wires join holes and off-board lugs, so name the hole instead");
            }
            r_.fail("wire end " + inQuotes(text) + " names no off-board part " + inQuotes(lug.ref));
        }
        if (std::find(part->pins.begin(), part->pins.end(), lug.pin) == part->pins.end()) {
            std::string lugs;
            for (const std::string& pin : part->pins) lugs += (lugs.empty() ? "" : ", ") + pin;
            r_.fail(lug.ref + " has no lug " + inQuotes(lug.pin) + " (its lugs: " + lugs + ")");
        }
    }

    void readWire(const Json& object) {
        r_.expectObject(object);
        Wire wire;
        wire.from = endpointMember(object, "from");
        wire.to = endpointMember(object, "to");
        if (wire.from == wire.to) r_.fail("wire joins " + wire.from.name() + " to itself");
        wire.color = r_.textMember(object, "color", false);
        wire.extra = r_.extras(object, {"from", "to", "color"});
        board_.wires.push_back(std::move(wire));
    }

    JsonReader& r_;
    const ReadLimits& limits_;
    Board board_;
    struct RefSeen {
        std::string ref;    // as written
        std::string where;  // path
    };
    std::unordered_map<std::string, RefSeen> refWhere_;  // ref identity -> where first seen
    std::map<std::string, std::string> cutWhere_;        // cut name -> path where first seen
};

Json gridToJson(const Board& board) {
    Json grid = Json::object();
    grid["rows"] = board.rows;
    grid["cols"] = board.cols;
    grid["pitch_mm"] = board.pitchMm;
    grid["copper"] = board.copper == CopperPattern::Pads ? "pads" : "strips";
    appendExtras(grid, board.boardExtra);
    return grid;
}

// The members every part starts with, on the board or off it.
Json partHead(const std::string& ref, const std::string& kind, const std::string& value) {
    Json out = Json::object();
    out["ref"] = ref;
    out["kind"] = kind;
    out["value"] = value;
    return out;
}

Json partToJson(const Part& part) {
    Json out = partHead(part.ref, part.kind, part.value);
    Json pins = Json::object();
    for (const Pin& pin : part.pins) pins[pin.name] = holeName(pin.hole);
    out["pins"] = std::move(pins);
    appendExtras(out, part.extra);
    return out;
}

Json linkToJson(const Link& link) {
    Json out = Json::object();
    out["from"] = holeName(link.from);
    out["to"] = holeName(link.to);
    if (link.copperSide) out["side"] = "copper";
    if (link.insulated) out["insulated"] = true;
    appendExtras(out, link.extra);
    return out;
}

Json offboardToJson(const OffboardPart& part) {
    Json out = partHead(part.ref, part.kind, part.value);
    out["pins"] = part.pins;
    appendExtras(out, part.extra);
    return out;
}

Json wireToJson(const Wire& wire) {
    Json out = Json::object();
    out["from"] = wire.from.name();
    out["to"] = wire.to.name();
    if (!wire.color.empty()) out["color"] = wire.color;
    appendExtras(out, wire.extra);
    return out;
}

template <class Item, class ToJson>
Json arrayOf(const std::vector<Item>& items, ToJson toJson) {
    Json out = Json::array();
    for (const Item& item : items) out.push_back(toJson(item));
    return out;
}

}  // namespace

ReadResult<Board> readBoard(std::string_view text, std::string_view fileName,
                            const ReadLimits& limits) {
    return readDocument<Board>(text, fileName, limits, [&](JsonReader& reader, const Json& root) {
        return BoardReader(reader, limits).read(root);
    });
}

std::string writeBoard(const Board& board) {
    Json out = Json::object();
    out["format"] = kBoardFormat;
    out["version"] = kBoardVersion;
    out["title"] = board.title;
    out["board"] = gridToJson(board);
    out["cuts"] = arrayOf(board.cuts, [](const Cut& cut) { return Json(cutName(cut)); });
    out["parts"] = arrayOf(board.parts, partToJson);
    out["links"] = arrayOf(board.links, linkToJson);
    out["offboard"] = arrayOf(board.offboard, offboardToJson);
    out["wires"] = arrayOf(board.wires, wireToJson);
    if (board.circuit) out["circuit"] = circuitToJson(*board.circuit);
    appendExtras(out, board.extra);
    return dumpDocument(out);
}

}  // namespace netcheck
