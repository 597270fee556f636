// Circuit text: reading (tokens, part lines, net lines, located errors) and printing.
#include "netcheck/file/circuit_text.hpp"

#include <algorithm>
#include <map>
#include <set>

#include "netcheck/model/name_rules.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/value.hpp"

namespace netcheck {

std::string CircuitTextError::describe() const {
    return "line " + std::to_string(line) + ", column " + std::to_string(column) + ": " + message;
}

namespace {

constexpr std::size_t kNone = std::string::npos;
constexpr std::string_view kNotConnected = "-";

// One word of a line. Quotes let a name hold blanks or the marks the syntax gives a meaning to.
struct Token {
    std::string text;
    int column = 0;
    std::size_t equals = kNone;  ///< where in `text` the first '=' outside quotes is
    std::vector<bool> quoted;    ///< per byte of `text`: written in quotes ("-" then names a net)
    bool colon = false;          ///< the ':' between a line's head and its pins or nets
    /// An unquoted "-" from byte `from` on: no net.
    bool notConnected(std::size_t from = 0) const {
        return text.substr(from) == kNotConnected && !quoted[from];
    }
};

bool isBlank(char c) {
    return c == ' ' || c == '\t' || c == '\r';
}

// Columns count characters, not bytes, so they match what the maker sees.
int columnAt(std::string_view line, std::size_t byte) {
    const auto head = line.substr(0, byte);
    return 1 + static_cast<int>(std::count_if(head.begin(), head.end(), [](char c) {
               return (static_cast<unsigned char>(c) & 0xC0) != 0x80;
           }));
}

std::string kindNames() {
    std::string names;
    for (const PartKind& kind : partKinds())
        names += (names.empty() ? "" : ", ") + std::string(kind.name);
    return names;
}

std::string lowered(std::string_view text) {
    std::string out(text);
    std::transform(out.begin(), out.end(), out.begin(), [](unsigned char c) {
        return static_cast<char>(c >= 'A' && c <= 'Z' ? c - 'A' + 'a' : c);
    });
    return out;
}

// Kinds are matched whatever their case ("Resistor", "LED"): a kind is never a name of the maker's.
const PartKind* kindNamed(std::string_view typed) {
    const std::string wanted = lowered(typed);
    for (const PartKind& kind : partKinds())
        if (kind.name == wanted) return &kind;
    return nullptr;
}

std::string pinList(const PartKind& kind) {
    std::string list;
    for (auto pin : kind.pins) list += (list.empty() ? "" : " ") + std::string(pin);
    return list;
}

class TextReader {
public:
    CircuitTextResult read(std::string_view text) {
        int lineNumber = 0;
        for (std::size_t start = 0; start <= text.size();) {
            const std::size_t end = std::min(text.find('\n', start), text.size());
            readLine(text.substr(start, end - start), ++lineNumber);
            start = end + 1;
        }
        for (const PendingPin& pending : netLinePins_) joinNetLinePin(pending);
        return finish();
    }

private:
    struct PendingPin {
        PinRef pin;
        std::string net;
        int line = 0;
        int column = 0;
    };
    struct Declared {
        std::string spelling;  ///< the ref as its part line writes it
        int line = 0;
    };

    void fail(int line, int column, std::string message) {
        errors_.push_back({line, column, std::move(message)});
    }

    void readLine(std::string_view line, int number) {
        std::vector<Token> tokens;
        if (!tokenize(line, number, tokens) || tokens.empty()) return;
        const auto colon =
            std::find_if(tokens.begin(), tokens.end(), [](const Token& t) { return t.colon; });
        const auto head = static_cast<std::size_t>(colon - tokens.begin());
        if (colon != tokens.end()) {
            const auto second =
                std::find_if(colon + 1, tokens.end(), [](const Token& t) { return t.colon; });
            if (second != tokens.end()) {
                fail(number, second->column,
                     "a second ':' on one line (names holding ':' go in quotes)");
                return;
            }
        }
        if (head == 0) {
            fail(number, tokens[0].column,
                 "the line starts with ':'; write NET: REF.PIN ... or REF KIND VALUE : NETS");
        } else if (head == 1 && colon != tokens.end()) {
            netLine(tokens, number);
        } else if (head == 1) {
            fail(number, tokens[0].column,
                 "\"" + tokens[0].text +
                     "\" alone: write a part as REF KIND VALUE : NETS (in the kind's pin order) "
                     "or a net as NET: REF.PIN REF.PIN ...");
        } else {
            partLine(tokens, head, number);
        }
    }

    bool tokenize(std::string_view line, int number, std::vector<Token>& out) {
        std::size_t i = 0;
        while (i < line.size()) {
            if (isBlank(line[i])) {
                ++i;
            } else if (line[i] == '#') {
                break;  // a comment to the end of the line
            } else if (line[i] == ':') {
                Token colon;
                colon.text = ":";
                colon.column = columnAt(line, i++);
                colon.colon = true;
                out.push_back(colon);
            } else if (!word(line, number, i, out)) {
                return false;
            }
        }
        return true;
    }

    bool word(std::string_view line, int number, std::size_t& i, std::vector<Token>& out) {
        Token token;
        token.column = columnAt(line, i);
        while (i < line.size() && !isBlank(line[i]) && line[i] != '#' && line[i] != ':') {
            if (line[i] != '"') {
                if (line[i] == '=' && token.equals == kNone) token.equals = token.text.size();
                token.text += line[i++];
                token.quoted.push_back(false);
                continue;
            }
            const std::size_t open = i++;
            for (;; ++i) {
                if (i >= line.size()) {
                    fail(number, columnAt(line, open), "this quote is not closed on its line");
                    return false;
                }
                if (line[i] == '"') break;
                if (line[i] == '\\' && i + 1 < line.size()) ++i;  // \" and \\ inside quotes
                token.text += line[i];
                token.quoted.push_back(true);
            }
            ++i;
        }
        out.push_back(std::move(token));
        return true;
    }

    void partLine(const std::vector<Token>& tokens, std::size_t head, int line) {
        const Token& ref = tokens[0];
        if (!declare(ref, line)) return;
        const Token& kindWord = tokens[1];
        const PartKind* kind = kindNamed(kindWord.text);
        if (kind == nullptr) {
            fail(line, kindWord.column,
                 "unknown kind \"" + kindWord.text + "\"" + nearKind(kindWord.text) +
                     "; the kinds are " + kindNames());
            return;
        }
        CircuitPart part;
        part.kind = std::string(kind->name);
        for (std::size_t i = 2; i < head; ++i) part.value += (i > 2 ? " " : "") + tokens[i].text;
        if (!valueUsable(part.value, *kind, ref.text, head > 2 ? tokens[2].column : 0, line))
            return;
        circuit_.parts[ref.text] = part;
        if (head == tokens.size()) return;  // no ':': a part not connected yet
        const std::vector<Token> pins(tokens.begin() + static_cast<std::ptrdiff_t>(head) + 1,
                                      tokens.end());
        const bool named =
            std::any_of(pins.begin(), pins.end(), [](const Token& t) { return t.equals != kNone; });
        if (named) {
            pinsByName(ref.text, *kind, pins, line);
        } else {
            pinsInOrder(ref.text, *kind, pins, tokens[head].column, line);
        }
    }

    // A ref is declared by one part line; refs differing only in case are one part.
    bool declare(const Token& ref, int line) {
        if (const auto problem = refProblem(ref.text)) {
            fail(line, ref.column, "ref \"" + ref.text + "\" " + *problem);
            return false;
        }
        const auto [at, fresh] = declared_.emplace(refIdentity(ref.text), Declared{ref.text, line});
        if (!fresh) {
            fail(line, ref.column,
                 "duplicate ref " + ref.text + " (" + at->second.spelling + " is on line " +
                     std::to_string(at->second.line) +
                     "; refs that differ only in case are one part)");
        }
        return fresh;
    }

    // The kind a maker probably meant: the one starting with the same three letters, or the kind
    // of the part a schematic's word names ("npn" is a bjt). A hint only: the text is refused.
    static std::string nearKind(std::string_view typed) {
        static const std::map<std::string, std::string> kSchematicWords = {
            {"npn", "bjt"},       {"pnp", "bjt"},           {"transistor", "bjt"},
            {"fet", "jfet"},      {"potentiometer", "pot"}, {"elko", "electrolytic"},
            {"cap", "capacitor"}, {"res", "resistor"},      {"chip", "ic"}};
        if (const auto word = kSchematicWords.find(lowered(typed)); word != kSchematicWords.end())
            return " (did you mean " + word->second + "?)";
        const std::string start = lowered(typed.substr(0, 3));
        for (const PartKind& kind : partKinds())
            if (start.size() == 3 && kind.name.substr(0, 3) == start)
                return " (did you mean " + std::string(kind.name) + "?)";
        return {};
    }

    bool valueUsable(const std::string& value, const PartKind& kind, const std::string& ref,
                     int column, int line) {
        if (const auto problem = textProblem(value)) {
            fail(line, column, ref + ": the value " + *problem);
            return false;
        }
        if (value.empty() || !kind.quantity || parseQuantity(value)) return true;
        fail(line, column,
             ref + ": \"" + value + "\" is not a value a " + std::string(kind.name) +
                 " can have (write it like 4k7, 100n, 2.2u or 10k lin)");
        return false;
    }

    void pinsInOrder(const std::string& ref, const PartKind& kind, const std::vector<Token>& nets,
                     int colonColumn, int line) {
        if (!kind.pins.empty() && nets.size() != kind.pins.size()) {
            const int column =
                nets.size() > kind.pins.size() ? nets[kind.pins.size()].column : colonColumn;
            fail(line, column,
                 ref + ": a " + std::string(kind.name) + " has " +
                     std::to_string(kind.pins.size()) + " pins (" + pinList(kind) + "): write " +
                     std::to_string(kind.pins.size()) +
                     " nets in that order, - for a pin not connected; " +
                     std::to_string(nets.size()) + " written");
            return;
        }
        for (std::size_t i = 0; i < nets.size(); ++i) {
            if (nets[i].notConnected()) continue;
            const std::string pin =
                kind.pins.empty() ? std::to_string(i + 1) : std::string(kind.pins[i]);
            join({ref, pin}, nets[i].text, line, nets[i].column);
        }
    }

    void pinsByName(const std::string& ref, const PartKind& kind, const std::vector<Token>& pins,
                    int line) {
        for (const Token& token : pins) {
            if (token.equals == kNone) {
                fail(line, token.column,
                     ref + ": write every pin as PIN=NET, or every net in pin order, not both");
                return;
            }
            const std::string pin = token.text.substr(0, token.equals);
            const std::string net = token.text.substr(token.equals + 1);
            if (!pinUsable(ref, pin, kind, line, token.column)) continue;
            if (token.notConnected(token.equals + 1)) continue;
            join({ref, pin}, net, line, token.column);
        }
    }

    bool pinUsable(const std::string& ref, const std::string& pin, const PartKind& kind, int line,
                   int column) {
        if (pin.empty() || pin.find_first_of(" \t") != kNone) {
            fail(line, column, ref + ": a pin name is empty or holds a blank");
            return false;
        }
        if (kind.pins.empty() ||
            std::find(kind.pins.begin(), kind.pins.end(), pin) != kind.pins.end())
            return true;
        fail(line, column,
             ref + " has no pin \"" + pin + "\": a " + std::string(kind.name) + "'s pins are " +
                 pinList(kind));
        return false;
    }

    void netLine(const std::vector<Token>& tokens, int line) {
        const Token& name = tokens[0];
        if (!netNameUsable(name.text, line, name.column)) return;
        circuit_.nets.try_emplace(name.text);
        for (std::size_t i = 2; i < tokens.size(); ++i) {
            const auto pin = PinRef::parse(tokens[i].text);
            if (!pin) {
                fail(line, tokens[i].column,
                     "\"" + tokens[i].text + "\" is not a pin: write REF.PIN, like R1.2 or Q1.B");
                continue;
            }
            if (const auto problem = refProblem(pin->ref)) {
                fail(line, tokens[i].column, "ref \"" + pin->ref + "\" " + *problem);
                continue;
            }
            netLinePins_.push_back({*pin, name.text, line, tokens[i].column});
        }
    }

    // After every part line is read, so a net line may name parts declared further down.
    void joinNetLinePin(const PendingPin& p) {
        const auto declared = declared_.find(refIdentity(p.pin.ref));
        if (declared != declared_.end()) {
            if (declared->second.spelling != p.pin.ref) {
                fail(p.line, p.column,
                     p.pin.ref + " is written " + declared->second.spelling + " on line " +
                         std::to_string(declared->second.line));
                return;
            }
            const auto part = circuit_.parts.find(p.pin.ref);
            const PartKind* kind =
                part == circuit_.parts.end() ? nullptr : findPartKind(part->second.kind);
            if (kind != nullptr && !pinUsable(p.pin.ref, p.pin.pin, *kind, p.line, p.column))
                return;
        }
        join(p.pin, p.net, p.line, p.column);
    }

    bool netNameUsable(const std::string& net, int line, int column) {
        std::optional<std::string> problem;
        if (net.empty())
            problem = "is empty";
        else
            problem = textProblem(net);
        if (problem) fail(line, column, "the net name " + *problem);
        return !problem;
    }

    void join(const PinRef& pin, const std::string& net, int line, int column) {
        if (!netNameUsable(net, line, column)) return;
        const auto [at, fresh] = netOfPin_.emplace(pin, std::make_pair(net, line));
        if (!fresh) {
            fail(line, column,
                 pin.name() + " is already in net " + at->second.first + " (line " +
                     std::to_string(at->second.second) + "); a pin is in one net only");
            return;
        }
        circuit_.nets[net].push_back(pin);
    }

    CircuitTextResult finish() {
        CircuitTextResult result;
        if (errors_.empty()) {
            for (auto& [name, pins] : circuit_.nets) std::sort(pins.begin(), pins.end());
            result.circuit = std::move(circuit_);
            return result;
        }
        std::stable_sort(errors_.begin(), errors_.end(), [](const auto& a, const auto& b) {
            return std::pair(a.line, a.column) < std::pair(b.line, b.column);
        });
        if (errors_.size() > kMaxCircuitTextErrors) errors_.resize(kMaxCircuitTextErrors);
        result.errors = std::move(errors_);
        return result;
    }

    Circuit circuit_;
    std::vector<CircuitTextError> errors_;
    std::map<std::string, Declared> declared_;                ///< by ref identity
    std::map<PinRef, std::pair<std::string, int>> netOfPin_;  ///< net and line of each pin
    std::vector<PendingPin> netLinePins_;
};

// ---- printing ----------------------------------------------------------------------------------

// Quotes a name when it could not be read back as written.
std::string written(std::string_view text) {
    const bool plain = !text.empty() && text != kNotConnected &&
                       std::none_of(text.begin(), text.end(), [](char c) {
                           return isBlank(c) || c == '\n' || c == '"' || c == '#' || c == ':' ||
                                  c == '=' || c == '\\';
                       });
    if (plain) return std::string(text);
    std::string out = "\"";
    for (char c : text) {
        if (c == '"' || c == '\\') out += '\\';
        out += c;
    }
    return out + "\"";
}

// A value is written as its words unless a quote is needed to keep it exactly.
std::string valueWords(const std::string& value) {
    if (value.empty()) return {};
    bool plain = value.front() != ' ' && value.back() != ' ' && value.find("  ") == kNone;
    for (std::size_t start = 0; plain && start < value.size();) {
        const std::size_t end = std::min(value.find(' ', start), value.size());
        const std::string_view piece = std::string_view(value).substr(start, end - start);
        plain = written(piece) == piece || piece == kNotConnected;
        start = end + 1;
    }
    return " " + (plain ? value : written(value));
}

// Pins numbered 1..N as a kind without pin names numbers them; 0 when `pin` is not such a number.
std::size_t pinNumber(const std::string& pin) {
    if (pin.empty() || pin.size() > 3 || pin[0] == '0' ||
        !std::all_of(pin.begin(), pin.end(), [](char c) { return c >= '0' && c <= '9'; }))
        return 0;
    return static_cast<std::size_t>(std::stoi(pin));
}

class TextWriter {
public:
    explicit TextWriter(const Circuit& circuit) : circuit_(circuit) {
        for (const auto& [net, pins] : circuit.nets)
            for (const PinRef& pin : pins) netOfPin_[pin] = net;
    }

    std::string write() {
        for (const auto& [ref, part] : circuit_.parts) partLine(ref, part);
        for (const auto& [net, pins] : circuit_.nets) netLine(net, pins);
        return text_;
    }

private:
    std::map<std::string, std::string> netsOf(const std::string& ref) const {
        std::map<std::string, std::string> nets;  // pin -> net
        for (auto at = netOfPin_.lower_bound(PinRef{ref, ""});
             at != netOfPin_.end() && at->first.ref == ref; ++at)
            nets[at->first.pin] = at->second;
        return nets;
    }

    void partLine(const std::string& ref, const CircuitPart& part) {
        text_ += written(ref) + " " + written(part.kind) + valueWords(part.value);
        const auto nets = netsOf(ref);
        if (const std::string pins = pinWords(ref, findPartKind(part.kind), nets); !pins.empty())
            text_ += " :" + pins;
        text_ += "\n";
    }

    std::string pinWords(const std::string& ref, const PartKind* kind,
                         const std::map<std::string, std::string>& nets) {
        std::vector<std::string> order;
        if (kind != nullptr && !kind->pins.empty()) {
            order.assign(kind->pins.begin(), kind->pins.end());
        } else if (kind != nullptr && std::all_of(nets.begin(), nets.end(), [](const auto& n) {
                       return pinNumber(n.first) > 0;
                   })) {
            std::size_t last = 0;
            for (const auto& [pin, net] : nets) last = std::max(last, pinNumber(pin));
            for (std::size_t n = 1; n <= last; ++n) order.push_back(std::to_string(n));
        } else {
            std::string words;
            for (const auto& [pin, net] : nets) {
                words += " " + written(pin) + "=" + written(net);
                printed_.insert({ref, pin});
            }
            return words;
        }
        std::string words;
        bool any = false;
        for (const std::string& pin : order) {
            const auto net = nets.find(pin);
            words += " " + (net == nets.end() ? std::string(kNotConnected) : written(net->second));
            if (net == nets.end()) continue;
            printed_.insert({ref, pin});
            any = true;
        }
        return any ? words : std::string();  // "D1 led : - -" would say no more than "D1 led"
    }

    // Pins no part line held (undeclared parts, pins the kind does not have), and nets with none.
    void netLine(const std::string& net, const std::vector<PinRef>& pins) {
        std::string words;
        for (const PinRef& pin : pins)
            if (!printed_.count(pin)) words += " " + written(pin.name());
        if (words.empty() && !pins.empty()) return;
        text_ += written(net) + ":" + words + "\n";
    }

    const Circuit& circuit_;
    std::map<PinRef, std::string> netOfPin_;
    std::set<PinRef> printed_;
    std::string text_;
};

}  // namespace

CircuitTextResult parseCircuitText(std::string_view text) {
    return TextReader().read(text);
}

std::string circuitText(const Circuit& circuit) {
    return TextWriter(circuit).write();
}

Circuit keepWhatTextCannotSay(Circuit typed, const Circuit& before) {
    typed.extra = before.extra;
    std::map<std::string, std::set<std::string>> usedPins;  // ref -> pins in the typed nets
    for (const auto& [net, pins] : typed.nets)
        for (const PinRef& pin : pins) usedPins[pin.ref].insert(pin.pin);
    for (auto& [ref, part] : typed.parts) {
        const auto old = before.parts.find(ref);
        if (old == before.parts.end()) continue;
        part.extra = old->second.extra;
        const auto& declared = old->second.pins;
        const auto& used = usedPins[ref];
        const bool fits = std::all_of(used.begin(), used.end(), [&](const std::string& pin) {
            return std::find(declared.begin(), declared.end(), pin) != declared.end();
        });
        if (old->second.kind == part.kind && part.pins.empty() && fits) part.pins = declared;
    }
    for (auto& [net, pins] : typed.nets) {
        const auto old = before.nets.find(net);
        if (old == before.nets.end()) continue;
        std::vector<PinRef> sorted = old->second;
        std::sort(sorted.begin(), sorted.end());
        if (sorted == pins) pins = old->second;
    }
    return typed;
}

}  // namespace netcheck
