// Reading the column-ordering instances of tests/layout-bench/: the MiniZinc data files (.dzn)
// of the open-stacks problem and their solution files (.sol). Just enough of the format for
// those files: `name = value;` items, integers, `[| a, b | c, d |]` matrices and `[a, b]` lists.
#pragma once

#include <cctype>
#include <map>
#include <optional>
#include <string>
#include <vector>

#include "netcheck/layout/column_order.hpp"

namespace layout_bench {

/// The items of a data file: each name with the integers of its value in reading order.
/// Nullopt with `problem` set when the text is not in that form.
inline std::optional<std::map<std::string, std::vector<long>>> readItems(const std::string& text,
                                                                          std::string& problem) {
    std::map<std::string, std::vector<long>> items;
    std::size_t at = 0;
    int line = 1;
    auto skipSpace = [&] {
        while (at < text.size()) {
            if (text[at] == '%') {
                while (at < text.size() && text[at] != '\n') ++at;
            } else if (std::isspace(static_cast<unsigned char>(text[at]))) {
                if (text[at] == '\n') ++line;
                ++at;
            } else {
                break;
            }
        }
    };
    for (skipSpace(); at < text.size(); skipSpace()) {
        std::string name;
        while (at < text.size() && (std::isalnum(static_cast<unsigned char>(text[at])) || text[at] == '_')) {
            name += text[at++];
        }
        skipSpace();
        if (name.empty() || at >= text.size() || text[at] != '=') {
            problem = "line " + std::to_string(line) + ": expected `name = value;`";
            return std::nullopt;
        }
        ++at;
        std::vector<long> values;
        for (;;) {
            skipSpace();
            // The last item may end without its `;` (tiny.dzn does).
            if (at >= text.size()) break;
            const char c = text[at];
            if (c == ';') {
                ++at;
                break;
            }
            if (std::isdigit(static_cast<unsigned char>(c)) || c == '-') {
                std::size_t used = 0;
                values.push_back(std::stol(text.substr(at, 24), &used));
                at += used;
            } else if (c == '[' || c == ']' || c == '|' || c == ',') {
                ++at;
            } else {
                problem = "line " + std::to_string(line) + ": unexpected `" + std::string(1, c) +
                          "` in `" + name + "`";
                return std::nullopt;
            }
        }
        items[name] = std::move(values);
    }
    return items;
}

/// The instance of a .dzn file: products are columns, customers are nets. Nullopt with
/// `problem` set when an item is missing or the matrix has the wrong size.
inline std::optional<netcheck::ColumnProblem> readInstance(const std::string& text,
                                                            std::string& problem) {
    const auto items = readItems(text, problem);
    if (!items) return std::nullopt;
    for (const char* name : {"c", "p", "orders"}) {
        if (!items->count(name)) {
            problem = std::string("no `") + name + "` item";
            return std::nullopt;
        }
    }
    const std::vector<long>& c = items->at("c");
    const std::vector<long>& p = items->at("p");
    const std::vector<long>& orders = items->at("orders");
    if (c.size() != 1 || p.size() != 1 || c[0] < 1 || p[0] < 1 || c[0] > 10000 || p[0] > 10000 ||
        orders.size() != static_cast<std::size_t>(c[0] * p[0])) {
        problem = "`orders` is not a c x p matrix";
        return std::nullopt;
    }
    netcheck::ColumnProblem instance;
    instance.nets = static_cast<int>(c[0]);
    instance.columnNets.resize(static_cast<std::size_t>(p[0]));
    for (long customer = 0; customer < c[0]; ++customer) {
        for (long product = 0; product < p[0]; ++product) {
            const long value = orders[static_cast<std::size_t>(customer * p[0] + product)];
            if (value != 0 && value != 1) {
                problem = "`orders` holds " + std::to_string(value) + ", not 0 or 1";
                return std::nullopt;
            }
            if (value == 1) {
                instance.columnNets[static_cast<std::size_t>(product)].push_back(
                    static_cast<int>(customer));
            }
        }
    }
    return instance;
}

}  // namespace layout_bench
