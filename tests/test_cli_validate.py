"""The ``validate`` command prints and writes the same table the test-suite asserts."""
import csv

from shortwave import cli
from shortwave.validation import all_checks, run_checks


def test_validate_prints_every_check_and_writes_csv(tmp_path, capsys):
    path = tmp_path / "validation.csv"
    status = cli.main(["validate", "--csv", str(path)])
    out = capsys.readouterr().out
    results = run_checks()
    assert status == (1 if any(not r.passed for r in results) else 0)
    with open(path, newline="") as fh:
        header = next(csv.reader(fh))
    with open(path, newline="") as fh:
        rows = list(csv.DictReader(fh))
    assert len(rows) == len(all_checks())
    assert {r["id"] for r in rows} == {c.id for c in all_checks()}
    for col in ("quantity", "source", "result"):
        assert any(h.startswith(col) for h in header)
    for c in all_checks()[:5]:
        assert c.id in out
    # each CSV row carries the model value the checks compute
    by_id = {r.check.id: r for r in results}
    for row in rows:
        model_col = next(k for k in row if k.startswith("model"))
        res = by_id[row["id"]]
        assert row["result"] == ("pass" if res.passed else ("ERROR" if res.error else "FAIL"))
        if res.passed:
            assert abs(float(row[model_col]) - res.model) <= 1e-6 * max(1.0, abs(res.model))


def test_validate_unknown_topic_is_one_line_error(capsys):
    status = cli.main(["validate", "--topic", "no-such-topic"])
    err = capsys.readouterr().err
    assert status == 2
    assert "no-such-topic" in err and len(err.strip().splitlines()) == 1


def test_validate_csv_into_missing_folder_fails_cleanly(tmp_path, capsys):
    status = cli.main(["validate", "--csv", str(tmp_path / "nowhere" / "v.csv")])
    err = capsys.readouterr().err
    assert status == 2 and "does not exist" in err


def test_validate_exit_status_is_one_when_a_check_fails(monkeypatch, capsys):
    import shortwave.validation as v
    from shortwave.validation import Check
    failing = Check(id="demo.deliberate-failure", quantity="two plus two", unit="1",
                    compute=lambda: 2 + 2, reference=5.0, source="arithmetic", rtol=0.0)
    monkeypatch.setattr(v, "all_checks", lambda: [failing])
    status = cli.main(["validate"])
    out = capsys.readouterr().out
    assert status == 1
    assert "FAIL" in out and "1 fail" in out
