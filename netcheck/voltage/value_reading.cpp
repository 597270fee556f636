#include "netcheck/voltage/value_reading.hpp"

#include <cctype>
#include <cstdlib>
#include <vector>

namespace netcheck {

namespace {

bool isDigit(char c) {
    return std::isdigit(static_cast<unsigned char>(c)) != 0;
}

bool isLetter(char c) {
    return std::isalpha(static_cast<unsigned char>(c)) != 0;
}

/// Reads digits with at most one '.' or ',' from `text` at `at`; returns the end index.
std::size_t numberEnd(std::string_view text, std::size_t at) {
    bool point = false;
    while (at < text.size()) {
        const char c = text[at];
        if (isDigit(c)) {
            ++at;
        } else if ((c == '.' || c == ',') && !point && at + 1 < text.size() &&
                   isDigit(text[at + 1])) {
            point = true;
            ++at;
        } else {
            break;
        }
    }
    return at;
}

double toNumber(std::string_view digits) {
    std::string copy(digits);
    for (char& c : copy) {
        if (c == ',') c = '.';
    }
    return std::strtod(copy.c_str(), nullptr);
}

}  // namespace

std::string lowerCase(std::string_view text) {
    std::string out(text);
    for (char& c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return out;
}

namespace {

// A number written in a value: where it starts and ends, and the first character after the
// blanks that follow it (where a unit such as '%' or 'V' would be).
struct NumberAt {
    std::size_t at = 0;
    std::size_t end = 0;
    std::size_t after = 0;
};

std::vector<NumberAt> numbersIn(std::string_view value) {
    std::vector<NumberAt> numbers;
    for (std::size_t at = 0; at < value.size(); ++at) {
        if (!isDigit(value[at]) || (at > 0 && (isDigit(value[at - 1]) || value[at - 1] == '.'))) {
            continue;
        }
        NumberAt number{at, numberEnd(value, at), 0};
        number.after = number.end;
        while (number.after < value.size() && value[number.after] == ' ') ++number.after;
        numbers.push_back(number);
    }
    return numbers;
}

}  // namespace

std::optional<double> toleranceInValue(std::string_view value) {
    for (const auto [at, end, after] : numbersIn(value)) {
        if (after < value.size() && value[after] == '%') return toNumber(value.substr(at, end - at)) / 100;
    }
    return std::nullopt;
}

std::string withoutTolerance(std::string_view value) {
    std::vector<std::string_view> words;
    std::size_t at = 0;
    while (at <= value.size()) {
        std::size_t end = value.find(' ', at);
        if (end == std::string_view::npos) end = value.size();
        const std::string_view word = value.substr(at, end - at);
        if (word == "%" && !words.empty()) {
            words.pop_back();  // "10k 5 %": the number before a lone '%' goes with it
        } else if (!word.empty() && word.find('%') == std::string_view::npos) {
            words.push_back(word);
        }
        at = end + 1;
    }
    std::string out;
    for (const std::string_view word : words) out += (out.empty() ? "" : " ") + std::string(word);
    return out;
}

std::optional<double> voltageInValue(std::string_view value) {
    for (const auto [at, end, after] : numbersIn(value)) {
        if (after >= value.size() || (value[after] != 'V' && value[after] != 'v')) continue;
        const bool negative = at > 0 && value[at - 1] == '-';
        double volts = toNumber(value.substr(at, end - at));
        // "3V3": the unit letter stands for the decimal point (IEC 60062 style).
        const std::size_t tail = after + 1;
        const std::size_t tailEnd = numberEnd(value, tail);
        if (after == end && tailEnd > tail && value.substr(at, end - at).find('.') == std::string_view::npos) {
            volts = toNumber(std::string(value.substr(at, end - at)) + "." +
                             std::string(value.substr(tail, tailEnd - tail)));
        } else if (tail < value.size() && isLetter(value[tail]) && (value[tail] | 0x20) != 'd' &&
                   (value[tail] | 0x20) != 'o') {
            // "9VA" or "5Vrms" is not a plain voltage; "9V DC", "9Volt" are ("d"/"o" follow).
            continue;
        }
        return negative ? -volts : volts;
    }
    return std::nullopt;
}

}  // namespace netcheck
