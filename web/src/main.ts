const root = document.getElementById("app");
if (root) root.textContent = "stitchplan";
