import { Sequelize } from 'sequelize';

export function createSequelize(url: string): Sequelize {
  return new Sequelize(url, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000 },
    define: { underscored: true },
  });
}
