// Subcircuits: `.subckt NAME ports...` ... `.ends`; nodes not on the `.subckt` line are local to
// it (ngspice manual, subcircuits). ngspice names expanded elements `r.x1.r3` and local nodes
// `x1.n`; we use the same path with the element letter left off: ref "X1.R3", node "X1.n".
#include "netcheck/spice/detail/spice_subckt.hpp"

#include <algorithm>

#include "netcheck/spice/detail/spice_annotations.hpp"

namespace netcheck::spice {

namespace {

std::string lineText(int line) {
    return std::to_string(line);
}

bool isCommand(const DeckLine& line, std::string_view word) {
    return line.type == DeckLine::Type::Command && lower(line.fields.front().text) == word;
}

Scope openSubckt(const DeckLine& line) {
    if (line.fields.size() < 2) throw DeckError{line.line, ".subckt without a name"};
    Scope scope;
    scope.name = line.fields[1].text;
    scope.line = line.line;
    std::set<std::string> seen;
    for (std::size_t i = 2; i < line.fields.size(); ++i) {
        const Field& f = line.fields[i];
        if (f.key || lower(f.text) == "params:") break;
        if (!seen.insert(lower(f.text)).second) {
            throw DeckError{line.line,
                            ".subckt " + scope.name + " lists port " + f.text + " twice"};
        }
        scope.ports.push_back(f.text);
    }
    return scope;
}

void addElement(Scope& scope, ElementPart part) {
    const auto [first, fresh] = scope.elementLines.emplace(lower(part.name), part.line);
    if (!fresh) {
        throw DeckError{part.line, "duplicate element name " + part.name + " (first on line " +
                                       lineText(first->second) + ")"};
    }
    scope.elements.push_back(std::move(part));
}

void noteCommand(const DeckLine& line, const ReadContext& context) {
    const std::string word = lower(line.fields.front().text);
    if (word == ".model" || word == ".endc") return;
    if (word == ".include" || word == ".inc" || word == ".lib") {
        context.note(line.line, word + " not followed: only this deck is read");
        return;
    }
    context.note(line.line, word + " ignored (not a circuit element)");
}

struct CallStep {
    std::string subckt;  // lower-case
    int line;
};

void checkScope(const DeckScopes& scopes, const Scope& scope, std::vector<CallStep>& stack,
                std::set<std::string>& done, const ReadLimits& limits) {
    for (const ElementPart& part : scope.elements) {
        if (part.subckt.empty()) continue;
        const std::string key = lower(part.subckt);
        const auto found = scopes.subckts.find(key);
        if (found == scopes.subckts.end()) {
            throw DeckError{part.line,
                            "unknown subcircuit " + part.subckt + " called by " + part.name};
        }
        const Scope& callee = found->second;
        if (callee.ports.size() != part.nodes.size()) {
            throw DeckError{part.line,
                            part.name + " gives " + lineText(static_cast<int>(part.nodes.size())) +
                                " nodes but .subckt " + callee.name + " (line " +
                                lineText(callee.line) + ") has " +
                                lineText(static_cast<int>(callee.ports.size())) + " ports"};
        }
        const bool onStack = std::any_of(stack.begin(), stack.end(),
                                         [&](const CallStep& s) { return s.subckt == key; });
        if (onStack) {
            std::string path;
            for (const CallStep& s : stack) path += scopes.subckts.at(s.subckt).name + " -> ";
            throw DeckError{part.line, "recursive subcircuit: " + path + callee.name};
        }
        if (static_cast<int>(stack.size()) >= limits.maxDepth) {
            throw DeckError{part.line,
                            "subcircuits nested more than " + lineText(limits.maxDepth) + " deep"};
        }
        if (done.contains(key)) continue;
        stack.push_back({key, part.line});
        checkScope(scopes, callee, stack, done, limits);
        stack.pop_back();
        done.insert(key);
    }
}

/// Expands one instance of a scope. `keyPrefix`/`shownPrefix` are "" at the top, "x1." / "X1."
/// inside X1; `portKeys` maps lower-case port names to the caller's node keys.
class Expander {
public:
    Expander(const DeckScopes& scopes, bool flatten, const ReadContext& context,
             const ReadLimits& limits, NodeNames& names, std::map<std::string, std::string>& nets)
        : scopes_(scopes),
          flatten_(flatten),
          context_(context),
          limits_(limits),
          names_(names),
          nets_(nets) {}

    std::vector<ElementPart> expand(const Scope& scope, const std::string& keyPrefix,
                                    const std::string& shownPrefix,
                                    const std::map<std::string, std::string>& portKeys) {
        const NodeResolver resolve = [&](const std::string& node) {
            return resolveNode(node, keyPrefix, shownPrefix, portKeys, 0);
        };
        std::vector<ElementPart> parts;
        for (const ElementPart& element : scope.elements) {
            const Scope* callee =
                element.subckt.empty() ? nullptr : &scopes_.subckts.at(lower(element.subckt));
            std::vector<std::string> keys;
            for (const std::string& node : element.nodes) {
                keys.push_back(resolveNode(node, keyPrefix, shownPrefix, portKeys, element.line));
            }
            if (callee != nullptr && flatten_ && !callee->elements.empty()) {
                appendInstance(parts, element, *callee, keys, keyPrefix, shownPrefix);
                continue;
            }
            ElementPart part = element;
            part.nodes = std::move(keys);
            if (callee != nullptr) {
                // The ports become pin names, which may not hold a '.' (found by fuzzing).
                for (const std::string& port : callee->ports) {
                    if (port.find('.') != std::string::npos) {
                        throw DeckError{callee->line, ".subckt " + callee->name + " port " + port +
                                                          " cannot name a pin: pin names hold no '.'"};
                    }
                }
                part.pins = callee->ports;
                part.subckt = callee->name;
                part.value = callee->name;
            }
            parts.push_back(std::move(part));
            countPart(element.line);
        }
        applyAnnotations(parts, scope.annotations, context_, resolve,
                         keyPrefix.empty() ? &nets_ : nullptr);
        return parts;
    }

private:
    void appendInstance(std::vector<ElementPart>& parts, const ElementPart& call,
                        const Scope& callee, const std::vector<std::string>& keys,
                        const std::string& keyPrefix, const std::string& shownPrefix) {
        std::map<std::string, std::string> ports;
        for (std::size_t i = 0; i < callee.ports.size(); ++i)
            ports[lower(callee.ports[i])] = keys[i];
        const std::string instance = upper(call.name);
        for (ElementPart child : expand(callee, keyPrefix + lower(call.name) + ".",
                                        shownPrefix + instance + ".", ports)) {
            child.name = instance + "." + child.name;
            child.ref = instance + "." + child.ref;
            parts.push_back(std::move(child));
        }
    }

    std::string resolveNode(const std::string& node, const std::string& keyPrefix,
                            const std::string& shownPrefix,
                            const std::map<std::string, std::string>& portKeys, int line) {
        const std::string local = lower(node);
        if (local == "0" || local == "gnd") return "0";
        if (const auto port = portKeys.find(local); port != portKeys.end()) return port->second;
        const bool global = scopes_.globals.contains(local);
        const std::string key = global ? local : keyPrefix + local;
        if (!names_.shown.contains(key)) {
            names_.shown[key] = global ? node : shownPrefix + node;
            names_.lines[key] = line;
        }
        return key;
    }

    void countPart(int line) {
        if (++count_ > limits_.maxParts) {
            throw DeckError{line, "more than " + std::to_string(limits_.maxParts) +
                                      " parts after expanding subcircuits"};
        }
    }

    const DeckScopes& scopes_;
    bool flatten_;
    const ReadContext& context_;
    const ReadLimits& limits_;
    NodeNames& names_;
    std::map<std::string, std::string>& nets_;
    std::size_t count_ = 0;
};

}  // namespace

DeckScopes collectScopes(const Deck& deck, const ReadContext& context, bool sourcesAsParts,
                         const ReadLimits& limits) {
    DeckScopes scopes;
    std::size_t elementCount = 0;
    std::vector<Scope> open;  // open[0] is the top level; nested definitions stack above it
    open.emplace_back();
    for (const DeckLine& line : deck.lines) {
        Scope& current = open.back();
        if (line.type == DeckLine::Type::Annotation) {
            current.annotations.push_back(line);
        } else if (line.type == DeckLine::Type::Element) {
            if (++elementCount > limits.maxParts) {
                throw DeckError{line.line, "more than " + std::to_string(limits.maxParts) +
                                               " elements in the deck"};
            }
            if (auto part = readElement(line, context, sourcesAsParts)) addElement(current, *part);
        } else if (isCommand(line, ".subckt")) {
            open.push_back(openSubckt(line));
        } else if (isCommand(line, ".ends")) {
            if (open.size() == 1) throw DeckError{line.line, ".ends without a .subckt"};
            Scope done = std::move(open.back());
            open.pop_back();
            const std::string key = lower(done.name);
            if (scopes.subckts.contains(key)) {
                throw DeckError{done.line, "subcircuit " + done.name +
                                               " defined twice (first on line " +
                                               lineText(scopes.subckts.at(key).line) + ")"};
            }
            scopes.subckts.emplace(key, std::move(done));
        } else if (isCommand(line, ".global")) {
            for (std::size_t i = 1; i < line.fields.size(); ++i) {
                scopes.globals.insert(lower(line.fields[i].text));
            }
        } else {
            noteCommand(line, context);
        }
    }
    if (open.size() > 1) {
        throw DeckError{open.back().line, ".subckt " + open.back().name + " has no .ends"};
    }
    scopes.top = std::move(open.front());
    return scopes;
}

void checkCalls(const DeckScopes& scopes, const ReadLimits& limits) {
    std::set<std::string> done;
    std::vector<CallStep> stack;
    checkScope(scopes, scopes.top, stack, done, limits);
    for (const auto& [key, scope] : scopes.subckts) {
        if (done.contains(key)) continue;
        stack.push_back({key, scope.line});
        checkScope(scopes, scope, stack, done, limits);
        stack.pop_back();
        done.insert(key);
    }
}

std::vector<ElementPart> expandTop(const DeckScopes& scopes, bool flatten,
                                   const ReadContext& context, const ReadLimits& limits,
                                   NodeNames& names,
                                   std::map<std::string, std::string>& netOverrides) {
    Expander expander(scopes, flatten, context, limits, names, netOverrides);
    std::vector<ElementPart> parts = expander.expand(scopes.top, "", "", {});
    // Annotations inside definitions are checked even where a definition is not expanded, so a
    // malformed one is reported whatever the options.
    ReadContext quiet = context;
    quiet.notes = nullptr;
    for (const auto& [key, scope] : scopes.subckts) {
        NodeNames scratchNames;
        std::map<std::string, std::string> scratchNets;
        std::map<std::string, std::string> ports;
        for (const std::string& port : scope.ports) ports[lower(port)] = "port:" + lower(port);
        Expander check(scopes, false, quiet, limits, scratchNames, scratchNets);
        check.expand(scope, key + ".", scope.name + ".", ports);
    }
    return parts;
}

}  // namespace netcheck::spice
