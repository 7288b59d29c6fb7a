import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A person who can sign in. E-mail is stored lower-cased and is unique; only a bcrypt hash of the password is kept. */
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare email: string;
  declare passwordHash: string;
  /** Bumped when the password changes; sessions carrying an older value are refused. */
  declare sessionVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof User {
    User.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        email: {
          type: DataTypes.STRING(254),
          allowNull: false,
          unique: true,
          set(value: string) {
            this.setDataValue("email", value.trim().toLowerCase());
          },
        },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false },
        sessionVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "users", modelName: "User", underscored: true },
    );
    return User;
  }
}
