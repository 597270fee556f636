// The table of part kinds. Pin names follow the trade's usual letters; spans are common practice
// for parts lying flat on a 0.1 in grid (a 1/4 W resistor 4 holes apart, a small diode 3, a 5 mm
// film box capacitor 2, a small radial electrolytic or LED 1).
#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

namespace {

std::vector<PartKind> makeTable() {
    // clang-format off
    return {
        // name            label                         pins                    polar  qty    off    span
        {"resistor",       "Resistor",                   {"1", "2"},             false, true,  false, 4},
        {"capacitor",      "Capacitor",                  {"1", "2"},             false, true,  false, 2},
        {"electrolytic",   "Electrolytic capacitor",     {"+", "-"},             true,  true,  false, 1},
        {"inductor",       "Inductor",                   {"1", "2"},             false, true,  false, 4},
        {"diode",          "Diode",                      {"A", "K"},             true,  false, false, 3},
        {"led",            "LED",                        {"A", "K"},             true,  false, false, 1},
        {"zener",          "Zener diode",                {"A", "K"},             true,  false, false, 3},
        {"bjt",            "Bipolar transistor",         {"C", "B", "E"},        true,  false, false, 0},
        {"jfet",           "JFET",                       {"D", "G", "S"},        true,  false, false, 0},
        {"mosfet",         "MOSFET",                     {"D", "G", "S"},        true,  false, false, 0},
        {"regulator",      "Voltage regulator",          {"IN", "GND", "OUT"},   true,  false, false, 0},
        {"ic",             "Integrated circuit",         {},                     true,  false, false, 0},
        {"trimmer",        "Trimmer",                    {"1", "2", "3"},        false, true,  false, 0},
        {"header",         "Pin header",                 {},                     true,  false, false, 0},
        {"crystal",        "Crystal",                    {"1", "2"},             false, false, false, 2},
        {"fuse",           "Fuse",                       {"1", "2"},             false, false, false, 4},
        {"wire-terminal",  "Wire terminal",              {},                     true,  false, false, 0},
        {"pot",            "Potentiometer",              {"1", "2", "3"},        false, true,  true,  0},
        {"jack",           "Jack socket (mono)",         {"T", "S"},             true,  false, true,  0},
        {"mono-jack",      "Mono jack socket",           {"T", "S"},             true,  false, true,  0},
        {"stereo-jack",    "Stereo jack socket",         {"T", "R", "S"},        true,  false, true,  0},
        {"switch",         "Switch",                     {},                     true,  false, true,  0},
        {"footswitch",     "Footswitch",                 {},                     true,  false, true,  0},
        {"dc-jack",        "DC power jack",              {"+", "-"},             true,  false, true,  0},
        {"battery",        "Battery snap",               {"+", "-"},             true,  false, true,  0},
        {"panel-led",      "Panel LED",                  {"A", "K"},             true,  false, true,  0},
    };
    // clang-format on
}

}  // namespace

std::span<const PartKind> partKinds() {
    static const std::vector<PartKind> kTable = makeTable();
    return kTable;
}

const PartKind* findPartKind(std::string_view name) {
    for (const PartKind& kind : partKinds()) {
        if (kind.name == name) return &kind;
    }
    return nullptr;
}

}  // namespace netcheck
