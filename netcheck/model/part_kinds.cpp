// The table of part kinds. Pin names follow the trade's usual letters; spans are common practice
// for parts lying flat on a 0.1 in grid (a 1/4 W resistor 4 holes apart, a small diode 3, a 5 mm
// film box capacitor 2, a small radial electrolytic or LED 1). The reference letters are the
// trade's usual ones (common practice, close to IEEE 315's class letters, from memory), one rule
// for every kind: a part is named by what it is, so an LED, on the board or on the panel, is a
// diode: D. README.md's table of part kinds lists them.
#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

namespace {

std::vector<PartKind> makeTable() {
    // clang-format off
    return {
        // name            label                         pins                    polar  qty    off    span ref
        {"resistor",       "Resistor",                   {"1", "2"},             false, true,  false, 4, "R"  },
        {"capacitor",      "Capacitor",                  {"1", "2"},             false, true,  false, 2, "C"  },
        {"electrolytic",   "Electrolytic capacitor",     {"+", "-"},             true,  true,  false, 1, "C"  },
        {"inductor",       "Inductor",                   {"1", "2"},             false, true,  false, 4, "L"  },
        {"diode",          "Diode",                      {"A", "K"},             true,  false, false, 3, "D"  },
        {"led",            "LED",                        {"A", "K"},             true,  false, false, 1, "D"  },
        {"zener",          "Zener diode",                {"A", "K"},             true,  false, false, 3, "D"  },
        {"bjt",            "Bipolar transistor",         {"C", "B", "E"},        true,  false, false, 0, "Q"  },
        {"jfet",           "JFET",                       {"D", "G", "S"},        true,  false, false, 0, "Q"  },
        {"mosfet",         "MOSFET",                     {"D", "G", "S"},        true,  false, false, 0, "Q"  },
        {"regulator",      "Voltage regulator",          {"IN", "GND", "OUT"},   true,  false, false, 0, "U"  },
        {"ic",             "Integrated circuit",         {},                     true,  false, false, 0, "U"  },
        {"trimmer",        "Trimmer",                    {"1", "2", "3"},        false, true,  false, 0, "RV" },
        {"header",         "Pin header",                 {},                     true,  false, false, 0, "J"  },
        {"crystal",        "Crystal",                    {"1", "2"},             false, false, false, 2, "X"  },
        {"fuse",           "Fuse",                       {"1", "2"},             false, false, false, 4, "F"  },
        {"wire-terminal",  "Wire terminal",              {},                     true,  false, false, 0, "TB" },
        {"pot",            "Potentiometer",              {"1", "2", "3"},        false, true,  true,  0, "VR" },
        {"jack",           "Jack socket (mono)",         {"T", "S"},             true,  false, true,  0, "J"  },
        {"mono-jack",      "Mono jack socket",           {"T", "S"},             true,  false, true,  0, "J"  },
        {"stereo-jack",    "Stereo jack socket",         {"T", "R", "S"},        true,  false, true,  0, "J"  },
        {"switch",         "Switch",                     {},                     true,  false, true,  0, "SW" },
        {"footswitch",     "Footswitch",                 {},                     true,  false, true,  0, "SW" },
        {"dc-jack",        "DC power jack",              {"+", "-"},             true,  false, true,  0, "J"  },
        {"battery",        "Battery snap",               {"+", "-"},             true,  false, true,  0, "BT" },
        {"panel-led",      "Panel LED",                  {"A", "K"},             true,  false, true,  0, "D"  },
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
