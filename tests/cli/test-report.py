#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""twofold-cli report: every design to Markdown, HTML and PDF.

Usage: test-report.py TWOFOLD_CLI SOURCE_DIR

The reference for every number is `twofold-cli analyse --json` on the same file: a report
must carry each number's label, its value and all its digits exactly as the JSON has them,
and the analysis file text it embeds must reproduce the same JSON when analysed again.
The PDF is read back with poppler-utils (pdfinfo, pdftotext) when they are installed.
"""
import html
import html.parser
import json
import os
import re
import shutil
import subprocess
import sys
import tempfile
import urllib.parse
import xml.etree.ElementTree as ET

from cli_check import check, cli, finish, run

source_dir = sys.argv[2]
KINDS = ["densities", "sensitivity", "sample-size", "null-distribution", "model-probabilities"]




def analysis(design, title, data, null="", alternative="", models="PriorNull=0.5\n"):
    return (f"[Analysis]\nFormat=1\nDesign={design}\nTitle={title}\n\n[Data]\n{data}\n"
            f"[Null]\n{null}\n[Alternative]\n{alternative}\n[Models]\n{models}\n"
            "[Options]\nLevel=0.95\n")


# Small analyses of every design (invented data, for the report's shape only).
CASES = {
    "one-proportion": analysis("one-proportion", "Defects against 2 %", "Successes=31\nTrials=1000\n",
                               "Kind=point\nValue=0.02\n", "Direction=two-sided\nPrior=beta\nPriorA=1\nPriorB=19\n"),
    "one-proportion-models": analysis("one-proportion", "Model set", "Successes=31\nTrials=1000\n",
                                      "Kind=point\nValue=0.02\n", "Prior=beta\nPriorA=1\nPriorB=1\n",
                                      "Set=null;less;greater\nPriors=0.5;0.25;0.25\n"),
    "one-proportion-interval": analysis("one-proportion", "Interval null", "Successes=31\nTrials=1000\n",
                                        "Kind=interval\nLow=0.015\nHigh=0.025\n", "Prior=beta\n"),
    "two-proportions": analysis("two-proportions", "Two groups",
                                "SuccessesA=45\nTrialsA=120\nSuccessesB=30\nTrialsB=118\n", "",
                                "Prior=beta\n"),
    "one-mean": analysis("one-mean", "One mean", "N=20\nMean=1.3\nSD=2.1\n", "Value=0\n",
                         "Prior=cauchy\nPriorScale=0.7071\n"),
    "one-mean-values": analysis("one-mean", "Raw values, known SD",
                                "Values=1.2;0.4;2.2;-0.3;1.9;0.8;1.1\nKnownSD=1\n", "Value=0\n",
                                "Direction=greater\nPrior=normal\nPriorScale=1\n"),
    "paired-means": analysis("paired-means", "Pairs", "N=15\nMeanDiff=0.8\nSDDiff=1.5\n", "Value=0\n"),
    "two-means": analysis("two-means", "Welch", "NA=20\nMeanA=5.1\nSDA=1.2\nNB=22\nMeanB=4.3\nSDB=1.4\n"
                          "EqualVariances=false\n"),
    "two-means-values": analysis("two-means", "Student, values", "ValuesA=5.1;4.8;6.0;5.5\n"
                                 "ValuesB=4.1;4.6;3.9;4.4;4.0\nEqualVariances=true\n"),
    "one-rate": analysis("one-rate", "One rate", "Events=12\nExposure=1000\n", "Value=0.008\n",
                         "Prior=gamma\nPriorShape=1\nPriorRate=100\n"),
    "two-rates": analysis("two-rates", "Two rates",
                          "EventsA=30\nExposureA=1000\nEventsB=18\nExposureB=1100\n"),
    # user text that must be escaped in HTML and in Markdown
    "escaping": analysis("one-proportion", '<b>&"x"</b> `*_[a](b)_*` | #1 &amp; \\\\n',
                         "Successes=9700\nTrials=12000\n", "Value=0.8\n"),
}


def md_unescape(text):
    return re.sub(r"\\([!-/:-@\[-`{-~])", r"\1", text)


def words(text):
    return " ".join(text.split())


class HtmlReport(html.parser.HTMLParser):
    """Table rows (the text of each cell), the <pre> text, the title and every id."""

    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.rows, self.row, self.cell = [], None, None
        self.pre, self.in_pre, self.title, self.in_title = "", False, "", False
        self.ids, self.links, self.svgs, self.tags = [], [], 0, set()

    def handle_starttag(self, tag, attrs):
        a = dict(attrs)
        self.tags.add(tag)
        if "id" in a:
            self.ids.append(a["id"])
        for k in ("href", "src", "xlink:href"):
            if k in a:
                self.links.append(a[k])
        if tag == "tr":
            self.row = []
        elif tag in ("td", "th") and self.row is not None:
            self.cell = ""
        elif tag == "pre":
            self.in_pre = True
        elif tag == "title":
            self.in_title = True
        elif tag == "svg":
            self.svgs += 1

    def handle_endtag(self, tag):
        if tag in ("td", "th") and self.cell is not None:
            self.row.append(self.cell)
            self.cell = None
        elif tag == "tr" and self.row is not None:
            self.rows.append(self.row)
            self.row = None
        elif tag == "pre":
            self.in_pre = False
        elif tag == "title":
            self.in_title = False

    def handle_data(self, data):
        if self.cell is not None:
            self.cell += data
        if self.in_pre:
            self.pre += data
        if self.in_title:
            self.title += data


def check_numbers(name, rows, numbers):
    """rows: id -> (label, value, digits). numbers: the JSON's."""
    for n in numbers:
        row = rows.get(n["id"])
        check(f"{name}: row {n['id']}", row is not None, sorted(rows))
        if row is None:
            continue
        label, value, digits = row
        check(f"{name}: {n['id']} label", label == n["label"], (label, n["label"]))
        if n["status"] == "ok":
            check(f"{name}: {n['id']} all digits", float(digits) == n["value"], (digits, n["value"]))
            check(f"{name}: {n['id']} value shown", value and "not defined" not in value, value)
        else:
            check(f"{name}: {n['id']} not defined", value.startswith("not defined"), value)
            check(f"{name}: {n['id']} reason", n["reason"] in value, (value, n["reason"]))


def no_nan(name, text):
    check(f"{name}: no NaN or inf", not re.search(r"\b(nan|inf|infinity)\b", text, re.I),
          re.findall(r".{30}\b(?:nan|inf|infinity)\b.{30}", text, re.I)[:3])


def check_markdown(name, path, doc, caution):
    text = open(path, encoding="utf-8").read()
    check(f"{name}: md caution", caution in text)
    no_nan(f"{name} md", text)
    rows = {}
    for line in text.splitlines():
        m = re.match(r"^\| (.*) \| (.*) \| (.*) \| `([a-z0-9_]+)` \|$", line)
        if m:
            rows[m.group(4)] = tuple(md_unescape(c) for c in m.group(1, 2, 3))
    check_numbers(f"{name} md", rows, doc["numbers"])
    m = re.search(r"^## The analysis file\n.*?^(`{3,})\n(.*?)^\1$", text, re.M | re.S)
    check(f"{name}: md analysis file block", m is not None)
    embedded = m.group(2) if m else ""
    # the figures: each kind drawn in a file beside the report and linked, or left out
    folder, stem = os.path.dirname(path), os.path.basename(path)[:-3]
    links = re.findall(r"!\[[^\]]*\]\(([^)]+)\)", text)
    drawn = [k for k in KINDS if os.path.exists(os.path.join(folder, f"{stem}-{k}.svg"))]
    check(f"{name}: md links the figures written",
          sorted(urllib.parse.unquote(l) for l in links) == sorted(f"{stem}-{k}.svg" for k in drawn),
          (links, drawn))
    check(f"{name}: md each kind drawn or left out with a reason",
          len(drawn) + text.count("Left out: ") == len(KINDS), (drawn, text.count("Left out: ")))
    for k in drawn:
        try:
            root = ET.parse(os.path.join(folder, f"{stem}-{k}.svg")).getroot()
            check(f"{name}: {k}.svg is SVG", root.tag.endswith("svg"), root.tag)
        except ET.ParseError as e:
            check(f"{name}: {k}.svg parses", False, e)
    return text, embedded, len(drawn)


def check_html(name, path, doc, caution, embedded, n_figures, title):
    text = open(path, encoding="utf-8").read()
    parser = HtmlReport()
    parser.feed(text)
    check(f"{name}: html doctype", text.startswith("<!DOCTYPE html>"))
    check(f"{name}: html caution", caution in html.unescape(text))
    no_nan(f"{name} html", re.sub(r"<svg.*?</svg>", "", text, flags=re.S))
    rows = {r[-1]: tuple(r[:3]) for r in parser.rows if len(r) == 4}
    check_numbers(f"{name} html", rows, doc["numbers"])
    pre = parser.pre[1:] if parser.pre.startswith("\n") else parser.pre
    check(f"{name}: html and md embed the same file text", pre == embedded)
    data = [l for l in parser.links if l.startswith("data:")]
    check(f"{name}: html download link", len(data) == 1 and
          urllib.parse.unquote(data[0].split(",", 1)[1]) == embedded)
    check(f"{name}: html self-contained",
          not ({"script", "link", "img", "iframe", "object"} & parser.tags)
          and all(l.startswith("#") or l.startswith("data:") for l in parser.links),
          [l for l in parser.links if not l.startswith(("#", "data:"))][:5])
    check(f"{name}: html inline svg per figure", parser.svgs == n_figures, (parser.svgs, n_figures))
    check(f"{name}: html ids unique", len(parser.ids) == len(set(parser.ids)),
          [i for i in set(parser.ids) if parser.ids.count(i) > 1][:5])
    check(f"{name}: html title", parser.title == title, (parser.title, title))
    return text


def check_pdf(name, path, doc, caution):
    if not (shutil.which("pdfinfo") and shutil.which("pdftotext")):
        print("SKIP pdf checks: poppler-utils not installed")
        return
    info = subprocess.run(["pdfinfo", path], capture_output=True, text=True)
    check(f"{name}: pdfinfo reads it", info.returncode == 0, info.stderr)
    size = re.search(r"^Page size:\s+([\d.]+) x ([\d.]+) pts", info.stdout, re.M)
    # A4 is 210 x 297 mm = 595.276 x 841.890 pt (1 in = 25.4 mm = 72 pt)
    check(f"{name}: pdf A4", size and abs(float(size.group(1)) - 595.276) < 0.01
          and abs(float(size.group(2)) - 841.890) < 0.01, info.stdout)
    pages = int(re.search(r"^Pages:\s+(\d+)", info.stdout, re.M).group(1))
    text = subprocess.run(["pdftotext", "-enc", "UTF-8", path, "-"], capture_output=True,
                          text=True).stdout
    flat = words(text)
    check(f"{name}: pdf caution", words(caution) in flat)
    p = next(n for n in doc["numbers"] if n["id"] == "p_value")
    check(f"{name}: pdf p-value digits", p["status"] != "ok" or repr(p["value"]) in flat
          or str(p["value"]) in flat, p)
    check(f"{name}: pdf page numbers", f"Page 1 of {pages}" in flat and f"Page {pages} of {pages}" in flat)
    for n in doc["numbers"]:
        check(f"{name}: pdf id {n['id']}", n["id"] in flat.replace("- ", "-"))
    no_nan(f"{name} pdf", text)


with tempfile.TemporaryDirectory() as tmp:
    for name, content in CASES.items():
        src = os.path.join(tmp, f"{name}.twofold")
        with open(src, "w", encoding="utf-8") as f:
            f.write(content)
        code, out, err = run("analyse", src, "--json")
        check(f"{name}: analyse exit 0", code == 0, err)
        if code != 0:
            continue
        doc = json.loads(out)
        caution = run("analyse", src)[1].rstrip("\n").split("\n")[-1]
        check(f"{name}: caution known", "qualified statistician" in caution, caution)
        title = doc.get("title", "")
        outs = {}
        for ext in ("md", "html", "pdf"):
            outs[ext] = os.path.join(tmp, f"{name}-report.{ext}")
            code, o, e = run("report", src, "--output", outs[ext])
            check(f"{name}: report .{ext} exit 0", code == 0, e)
            check(f"{name}: report .{ext} quiet", o == "", o)
        md, embedded, n_figures = check_markdown(name, outs["md"], doc, caution)
        page = check_html(name, outs["html"], doc, caution, embedded, n_figures, title)
        check_pdf(name, outs["pdf"], doc, caution)

        # reproducibility: the embedded text, saved and analysed, gives the same JSON
        again = os.path.join(tmp, f"{name}-again.twofold")
        with open(again, "w", encoding="utf-8") as f:
            f.write(embedded)
        code, out2, err = run("analyse", again, "--json")
        check(f"{name}: embedded file analyses", code == 0, err)
        check(f"{name}: embedded file reproduces the JSON", out2 == out)
        # and it is written back as it was read: a report of it embeds the same text
        code, _, err = run("report", again, "--output", os.path.join(tmp, f"{name}-again.md"))
        _, embedded2, _ = check_markdown(f"{name} again", os.path.join(tmp, f"{name}-again.md"),
                                         doc, caution)
        check(f"{name}: embedded text is a fixed point", embedded2 == embedded)

        if name == "escaping":
            raw = '<b>&"x"</b>'
            check("escaping: html has no raw title", raw not in page)
            check("escaping: html escapes the title",
                  "&lt;b&gt;&amp;&quot;x&quot;&lt;/b&gt;" in page, page[:600])
            check("escaping: md title escaped",
                  md.startswith("# \\<b\\>&\"x\"\\</b\\> \\`\\*\\_\\[a\\](b)\\_\\*\\` \\| \\#1 \\&amp;"),
                  md.splitlines()[0])
            check("escaping: md embeds the title verbatim", f"Title={title}" in embedded
                  or "Title=" in embedded, embedded[:200])

    # --- bad files and bad usage: exit 2, a message, nothing written -----------------------
    good = CASES["one-proportion"]
    bad = os.path.join(tmp, "bad.twofold")
    with open(bad, "w", encoding="utf-8") as f:
        f.write(good.replace("Trials=1000", "Trials=0"))
    for ext in ("md", "html", "pdf"):
        target = os.path.join(tmp, f"bad-out.{ext}")
        code, out, err = run("report", bad, "--output", target)
        check(f"bad file .{ext}: exit 2", code == 2, (code, err))
        check(f"bad file .{ext}: names file, group and key", bad in err and "[Data] Trials" in err, err)
        check(f"bad file .{ext}: nothing written",
              not any(f.startswith("bad-out") for f in os.listdir(tmp)), os.listdir(tmp))

    src = os.path.join(tmp, "one-proportion.twofold")
    for ext in ("md", "html", "pdf"):
        missing = os.path.join(tmp, "no-such-folder", f"r.{ext}")
        code, out, err = run("report", src, "--output", missing)
        check(f"missing folder .{ext}: exit 2", code == 2, (code, err))
        check(f"missing folder .{ext}: message", "no-such-folder" in err and "does not exist" in err, err)
        check(f"missing folder .{ext}: nothing left", not os.path.exists(os.path.dirname(missing)))
    before = set(os.listdir(tmp))
    for args in (("--output", os.path.join(tmp, "r.txt")), (), ("--output",)):
        code, out, err = run("report", src, *args)
        check(f"report {args}: exit 2", code == 2, (code, err))
        check(f"report {args}: message", err.strip() != "", err)
    check("bad usage: nothing written", set(os.listdir(tmp)) == before, set(os.listdir(tmp)) - before)
    code, out, err = run("report", "--help")
    check("report --help names the files written", code == 0 and "OUT-KIND.svg" in out, out)

finish()
