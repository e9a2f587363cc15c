/** Task pane entry point (shared runtime: loaded in the same page as functions.js). */
const status = document.getElementById("status");
if (status) status.textContent = "zcell runs inside Excel.";
