"""A shop library shared by many users: two real user ids in one group, read-only files,
overwrite after a conflict, symbolic links, FIFOs and the litter of killed saves.

The two-user tests run child processes under other user and group ids with `setpriv`
(root only; skipped otherwise). No user accounts are created: numeric ids are enough.
"""

from __future__ import annotations

import os
import random
import shutil
import signal
import stat
import subprocess
import sys
import tempfile
import textwrap
import time
from pathlib import Path

import pytest

from shopbeam.errors import InputError
from shopbeam.jobs import library, storage

GROUP, ALICE, BOB = 42700, 42701, 42702
JOB = 'schema = 1\ntitle = "shared"\n'


def _root_and_setpriv() -> bool:
    return hasattr(os, "geteuid") and os.geteuid() == 0 and shutil.which("setpriv") is not None


needs_root = pytest.mark.skipif(not _root_and_setpriv(), reason="needs root and setpriv")


@pytest.fixture
def shop():
    """A setgid shop folder of group GROUP that both users reach (tmp_path is root-only)."""
    top = Path(tempfile.mkdtemp(prefix="shopbeam-shared-"))
    os.chmod(top, 0o755)
    folder = top / "shop"
    folder.mkdir()
    if _root_and_setpriv():
        os.chown(folder, 0, GROUP)
    os.chmod(folder, 0o2770)
    yield folder
    shutil.rmtree(top, ignore_errors=True)


def as_user(uid: int, code: str, *args: str, umask: int = 0o022) -> subprocess.CompletedProcess:
    cmd = ["setpriv", f"--reuid={uid}", f"--regid={uid}", f"--groups={GROUP}",
           sys.executable, "-c", f"import os; os.umask({umask}); " + textwrap.dedent(code),
           *args]
    return subprocess.run(cmd, capture_output=True, text=True, timeout=60,
                          env={**os.environ, "HOME": "/nonexistent"})


def cli_as(uid: int, *argv: str) -> subprocess.CompletedProcess:
    return as_user(uid, "import sys; from shopbeam.cli import main; sys.exit(main(sys.argv[1:]))",
                   *argv)


def only_jobs(folder: Path) -> list[str]:
    return sorted(os.listdir(folder))


@needs_root
def test_two_users_take_turns_saving_in_a_shared_folder(shop):
    a = shop / "preset.toml"
    save = "import sys; from shopbeam.jobs import storage as s; p = sys.argv[1]; "
    r = as_user(ALICE, save + "s.save_text(p, sys.argv[2])", str(a), JOB)
    assert r.returncode == 0, r.stderr
    st = os.stat(a)
    assert st.st_uid == ALICE and st.st_gid == GROUP and st.st_mode & 0o060 == 0o060
    # Bob edits Alice's preset (umask 022 would have locked him out before)
    r = as_user(BOB, save + "o = s.open_text(p); s.save_text(p, o.text + 'notes = \"b\"\\n', o)",
                str(a))
    assert r.returncode == 0, r.stderr
    assert 'notes = "b"' in a.read_text() and os.stat(a).st_gid == GROUP
    # and Alice again, then both copy over it with --overwrite
    r = as_user(ALICE, save + "o = s.open_text(p); s.save_text(p, o.text + '# a\\n', o)", str(a))
    assert r.returncode == 0, r.stderr
    for uid in (BOB, ALICE):
        r = cli_as(uid, "library", "copy", "bundled:demo", "--to", "shop", "--as", "preset",
                   "--overwrite", "--library", str(shop))
        assert r.returncode == 0, r.stderr
    assert "Loft beam" in a.read_text()
    assert only_jobs(shop) == ["preset.toml"]  # no lock file, no temp file
    st = os.stat(a)
    assert st.st_gid == GROUP and stat.S_IMODE(st.st_mode) & 0o060 == 0o060


@needs_root
def test_a_replaced_file_keeps_its_mode_and_group(tmp_path):
    top = Path(tempfile.mkdtemp(prefix="shopbeam-mode-"))
    try:
        os.chmod(top, 0o755)
        folder = top / "plain"  # not setgid: the group must be copied from the old file
        folder.mkdir()
        os.chown(folder, 0, GROUP)
        os.chmod(folder, 0o770)
        p = folder / "job.toml"
        p.write_text(JOB)
        os.chown(p, ALICE, GROUP)
        os.chmod(p, 0o660)
        r = as_user(BOB, "import sys; from shopbeam.jobs import storage as s; "
                    "o = s.open_text(sys.argv[1]); s.save_text(sys.argv[1], o.text + '# b\\n', o)",
                    str(p), umask=0o077)
        assert r.returncode == 0, r.stderr
        st = os.stat(p)
        assert st.st_gid == GROUP and stat.S_IMODE(st.st_mode) == 0o660 and st.st_uid == BOB
    finally:
        shutil.rmtree(top, ignore_errors=True)


def test_a_read_only_job_is_refused_with_a_message(tmp_path):
    p = tmp_path / "ro.toml"
    p.write_text(JOB)
    os.chmod(p, 0o444)
    o = storage.open_text(p)
    with pytest.raises(InputError, match="read-only") as err:
        storage.save_text(p, JOB + "# x\n", o)
    assert str(p) in str(err.value)
    with pytest.raises(InputError, match="read-only"):
        storage.save_text(p, "x", None, overwrite=True)
    assert p.read_text() == JOB and stat.S_IMODE(os.stat(p).st_mode) == 0o444
    run = subprocess.run([sys.executable, "-m", "shopbeam", "library", "copy", "bundled:demo",
                          "--to", "shop", "--as", "ro", "--overwrite", "--library",
                          str(tmp_path)], capture_output=True, text=True)
    assert run.returncode == 2 and "read-only" in run.stderr and p.read_text() == JOB


def test_overwrite_after_a_conflict_rechecks_the_file(tmp_path):
    p = tmp_path / "job.toml"
    p.write_text(JOB)
    mine = storage.open_text(p)
    storage.save_text(p, JOB + "# second person\n", storage.open_text(p))
    with pytest.raises(storage.SaveConflict) as first:
        storage.save_text(p, JOB + "# mine\n", mine)
    # while I read the diff, a third person saves
    storage.save_text(p, JOB + "# third person\n", storage.open_text(p))
    with pytest.raises(storage.SaveConflict) as second:
        storage.save_text(p, JOB + "# mine\n", mine, overwrite=first.value)
    assert "third person" in second.value.diff and "third person" in p.read_text()
    storage.save_text(p, JOB + "# mine\n", mine, overwrite=second.value)  # seen: goes ahead
    assert p.read_text().endswith("# mine\n")


def test_library_follows_no_link_out_of_its_folder(tmp_path):
    shop = tmp_path / "shop"
    shop.mkdir()
    secret = tmp_path / "secret.toml"
    secret.write_text('title = "not yours"\n')
    (shop / "leak.toml").symlink_to(secret)
    (shop / "real.toml").write_text(JOB)
    (shop / "alias.toml").symlink_to("real.toml")
    names = {e.name: e for e in library.entries(str(shop)) if e.origin == "shop"}
    assert names["leak"].problem and names["leak"].title != "not yours"
    assert not names["alias"].problem
    for argv in (["library", "show", "shop:leak"], ["library", "copy", "shop:leak", "--to", "user",
                                                    "--as", "x"]):
        run = subprocess.run([sys.executable, "-m", "shopbeam", *argv, "--library", str(shop)],
                             capture_output=True, text=True,
                             env={**os.environ, "SHOPBEAM_USER_DIR": str(tmp_path / "u")})
        assert run.returncode == 2 and "not yours" not in run.stdout + run.stderr, argv
    # saving through the in-folder link edits its target; the link stays a link
    o = storage.open_text(shop / "alias.toml")
    storage.save_text(shop / "alias.toml", o.text + "# edited\n", o)
    assert (shop / "alias.toml").is_symlink() and (shop / "real.toml").read_text().endswith(
        "# edited\n")
    with pytest.raises(InputError):
        library.save_job(JOB, name="leak", to="shop", library_dir=str(shop), overwrite=True)
    assert secret.read_text() == 'title = "not yours"\n'


def test_a_new_job_is_never_written_through_a_link(tmp_path):
    # `shopbeam new NAME --overwrite` on a name that is a link out of the folder would replace
    # the file the link points to (another person's): refused, with the link named
    shop = tmp_path / "shop"
    shop.mkdir()
    secret = tmp_path / "elsewhere" / "secret.toml"
    secret.parent.mkdir()
    secret.write_text('title = "not yours"\n')
    (shop / "evil.toml").symlink_to(secret)
    here = str(Path(__file__).resolve().parents[1])  # this checkout's shopbeam, from any cwd
    run = subprocess.run([sys.executable, "-m", "shopbeam", "new", "evil.toml", "--overwrite"],
                         capture_output=True, text=True, cwd=shop,
                         env={**os.environ, "PYTHONPATH": here})
    assert run.returncode == 2 and "symbolic link" in run.stderr and "evil.toml" in run.stderr
    assert secret.read_text() == 'title = "not yours"\n' and (shop / "evil.toml").is_symlink()
    with pytest.raises(InputError):
        storage.save_text(shop / "evil.toml", JOB, None, overwrite=True)
    assert secret.read_text() == 'title = "not yours"\n'


def test_a_fifo_named_like_a_job_is_refused_at_once(tmp_path):
    if not hasattr(os, "mkfifo"):
        pytest.skip("no FIFOs here")
    f = tmp_path / "x.toml"
    os.mkfifo(f)
    for argv in (["solve", str(f)], ["check", str(f)], ["solve", "--json", str(f)]):
        run = subprocess.run([sys.executable, "-m", "shopbeam", *argv], capture_output=True,
                             text=True, timeout=60)
        assert run.returncode == 2 and "FIFO" in run.stderr and str(f) in run.stderr
    with pytest.raises(InputError, match="FIFO"):
        storage.open_text(f)
    # listed as a problem row (read never: no hang), not left out unsaid
    rows = [e for e in library.entries(str(tmp_path)) if e.origin == "shop"]
    assert [e.name for e in rows] == ["x"] and "FIFO" in rows[0].problem


SAVER = """
import sys
from shopbeam.jobs import storage
p = sys.argv[1]
text = "# " + "x" * 2_000_000 + "\\n"
print("READY", flush=True)
while True:
    storage.save_text(p, text, None, overwrite=True)
"""


def test_killed_saves_leave_nothing_after_the_next_open(tmp_path):
    p = tmp_path / "job.toml"
    p.write_text(JOB)
    rnd = random.Random(17)
    for _ in range(12):
        child = subprocess.Popen([sys.executable, "-c", SAVER, str(p)], stdout=subprocess.PIPE)
        assert child.stdout.readline().strip() == b"READY"
        time.sleep(rnd.uniform(0.0, 0.3))
        child.send_signal(signal.SIGKILL)
        child.wait()
        child.stdout.close()
        text = p.read_text()
        assert text == JOB or text.startswith("# xxx") and text.endswith("\n")  # never torn
    storage.open_text(p)
    assert only_jobs(tmp_path) == ["job.toml"]


def test_a_live_save_temp_is_never_removed(tmp_path):
    # a temp held by a live process (its flock) survives a tidy-up of the folder
    holder = subprocess.Popen([sys.executable, "-c", textwrap.dedent("""
        import fcntl, os, sys, time
        fd = os.open(sys.argv[1], os.O_CREAT | os.O_RDWR, 0o600)
        fcntl.flock(fd, fcntl.LOCK_EX)
        print("READY", flush=True)
        time.sleep(60)
    """), str(tmp_path / ".job.toml.abc.saving")], stdout=subprocess.PIPE)
    try:
        assert holder.stdout.readline().strip() == b"READY"
        (tmp_path / ".old.toml.def.saving").write_text("dead")
        removed = storage.clean_stale_temps(tmp_path)
        assert [r.name for r in removed] == [".old.toml.def.saving"]
        assert (tmp_path / ".job.toml.abc.saving").exists()
    finally:
        holder.kill()
        holder.wait()
        holder.stdout.close()
