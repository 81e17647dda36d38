import { expect, test } from "@playwright/test";
import { invitedUser } from "../support/app";
import { followMailedLink } from "./pages/mailbox-page";
import { expectSignedIn, SignInPage, signOut } from "./pages/sign-in-page";

test("an admin invites a contributor, who joins and signs in with that role", async ({ page }) => {
  const email = `invitee-${Date.now().toString(36)}@example.test`;
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("admin@cordarium.test");
  await expectSignedIn(page, "admin");
  await page.getByRole("link", { name: "Users" }).click();
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("contributor");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText(`Invitation sent to ${email}`)).toBeVisible();
  await signOut(page);

  await followMailedLink(page, email, /invited to Cordarium/, "/invitation/");
  await expect(page.getByText("You are invited as contributor")).toBeVisible();
  await page.getByLabel("Your name, as colleagues should see it").fill("Ines Wetterholt");
  await page.getByLabel("New password").fill("a good long passphrase");
  await page.getByLabel("The same password again").fill("a good long passphrase");
  await page.getByRole("button", { name: "Create my account" }).click();
  await page.getByRole("link", { name: "Sign in now" }).click();
  await signIn.withPassword(email, "a good long passphrase");
  await expectSignedIn(page, "contributor");
});

test("an admin changes a role and disables an account in the users table", async ({ page }) => {
  const user = await invitedUser("reader");
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("admin@cordarium.test");
  await expectSignedIn(page, "admin");
  await page.goto(`/admin/users?q=${encodeURIComponent(user.email)}`);
  const row = page.getByRole("row").filter({ hasText: user.email });
  await row.getByLabel(/Role of/).selectOption("editor");
  await expect(page.getByRole("main").getByRole("status").filter({ hasText: `${user.name}: editor` })).toBeVisible();
  await row.getByRole("button", { name: /Disable/ }).click();
  await expect(row).toContainText("Disabled");
  await page.goto("/admin/audit?entityType=user");
  await expect(page.getByText("user.disabled").first()).toBeVisible();
  await expect(page.getByText("user.role_changed").first()).toBeVisible();
});

test("the users table keeps its sort and filter in the address", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("admin@cordarium.test");
  await expectSignedIn(page, "admin");
  await page.goto("/admin/users");
  await page.getByRole("button", { name: "E-mail" }).click();
  await expect(page).toHaveURL(/sort=email/);
  await page.getByLabel("Show role").selectOption("editor");
  await expect(page).toHaveURL(/role=editor/);
  await page.reload();
  await expect(page.getByLabel("Show role")).toHaveValue("editor");
  await expect(page.getByRole("row").filter({ hasText: "editor@cordarium.test" })).toBeVisible();
});

test("a reader who opens an admin page is told it is not for their role", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("reader@cordarium.test");
  await expectSignedIn(page, "reader");
  await page.goto("/admin/users");
  await expect(page.getByRole("main").getByRole("alert")).toContainText("does not include them");
});
