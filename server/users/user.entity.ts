import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm'
import type { Role } from '../../shared/schemas/auth'

@Entity('user')
export class UserEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number

  @Column({ type: 'text', unique: true })
  email!: string

  @Column({ type: 'text' })
  name!: string

  @Column({ type: 'text' })
  role!: Role

  @Column({ type: 'text' })
  passwordHash!: string

  /** Set while an administrator has barred the account: it cannot sign in and its sessions are ended. */
  @Column({ type: Date, nullable: true })
  disabledAt!: Date | null

  /** The user's own site: stock answers name it first when it has the part. */
  @Column({ type: 'integer', nullable: true })
  homeSiteId!: number | null

  @CreateDateColumn()
  createdAt!: Date
}
