import type { Seed } from '../umzug';
import { initModels } from '../../models';
import { hashPassword } from '../passwords';
import { DEMO_PEOPLE, DEMO_WORKSPACES } from './demoScenario';

/**
 * Inserts the demo people, workspaces, memberships and projects. Each row is looked up before
 * it is created, so the seed is safe even if its meta row was lost.
 */
export const up: Seed = async ({ context: sequelize }) => {
  const { User, Workspace, Membership, Project } = initModels(sequelize);
  await sequelize.transaction(async (transaction) => {
    const userIdByEmail = new Map<string, number>();
    for (const person of DEMO_PEOPLE) {
      let user = await User.findOne({ where: { email: person.email }, transaction });
      if (!user) {
        user = await User.create(
          {
            email: person.email,
            displayName: person.displayName,
            passwordHash: await hashPassword(person.password),
            siteRole: person.siteRole,
          },
          { transaction },
        );
      }
      userIdByEmail.set(person.email, user.id);
    }
    for (const spec of DEMO_WORKSPACES) {
      const createdBy = userIdByEmail.get(spec.createdByEmail) ?? null;
      const [workspace] = await Workspace.findOrCreate({
        where: { slug: spec.slug },
        defaults: { slug: spec.slug, name: spec.name, description: spec.description, createdBy },
        transaction,
      });
      for (const project of spec.projects) {
        await Project.findOrCreate({
          where: { workspaceId: workspace.id, name: project.name },
          defaults: { workspaceId: workspace.id, name: project.name, description: project.description, createdBy },
          transaction,
        });
      }
      for (const person of DEMO_PEOPLE) {
        const role = person.memberships[spec.slug];
        if (!role) continue;
        await Membership.findOrCreate({
          where: { workspaceId: workspace.id, userId: userIdByEmail.get(person.email)! },
          defaults: { workspaceId: workspace.id, userId: userIdByEmail.get(person.email)!, role },
          transaction,
        });
      }
    }
  });
};

/** Removes the demo workspaces (memberships and projects cascade) and the demo people. */
export const down: Seed = async ({ context: sequelize }) => {
  const { User, Workspace } = initModels(sequelize);
  await sequelize.transaction(async (transaction) => {
    await Workspace.destroy({ where: { slug: DEMO_WORKSPACES.map((w) => w.slug) }, transaction });
    await User.destroy({ where: { email: DEMO_PEOPLE.map((p) => p.email) }, transaction });
  });
};
